/**
 * Gauss-Legendre rules: the n nodes and weights on [-1, 1], found by
 * Newton's method on the three-term recurrence of the Legendre polynomial
 * P_n from Tricomi's starting values (Davis & Rabinowitz 1984, "Methods of
 * Numerical Integration", 2nd ed., §2.7), and their use on an interval.
 */
export interface GaussLegendreRule {
  readonly nodes: Float64Array;
  readonly weights: Float64Array;
}

export function gaussLegendreRule(n: number): GaussLegendreRule {
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let derivative = 1;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = x;
      for (let j = 2; j <= n; j++) {
        const p2 = ((2 * j - 1) * x * p1 - (j - 1) * p0) / j;
        p0 = p1;
        p1 = p2;
      }
      derivative = (n * (x * p1 - p0)) / (x * x - 1);
      const dx = p1 / derivative;
      x -= dx;
      if (Math.abs(dx) < 1e-17) break;
    }
    nodes[i] = x;
    weights[i] = 2 / ((1 - x * x) * derivative * derivative);
  }
  return {nodes, weights};
}

/** ∫_a^b f by the rule. */
export function gaussLegendre(f: (x: number) => number, a: number, b: number, rule: GaussLegendreRule): number {
  const half = (b - a) / 2;
  const mid = (a + b) / 2;
  let sum = 0;
  for (let i = 0; i < rule.nodes.length; i++) sum += rule.weights[i]! * f(mid + half * rule.nodes[i]!);
  return sum * half;
}
