/**
 * The one input check shared by every adjustment method. Adjustments are
 * called by stet's own family code with p-values its methods computed, so a
 * bad value is a programmer error: a plain Error naming the function, never
 * a UserError.
 */
export function validatePValues(p: readonly number[], name: string): void {
  if (!Array.isArray(p)) throw new Error(`${name}: expected an array of p-values`);
  p.forEach((value, index) => {
    if (typeof value !== 'number' || !Number.isFinite(value) || value < 0 || value > 1) {
      throw new Error(`${name}: every p-value must be a finite number in [0, 1], but p[${index}] is ${String(value)}`);
    }
  });
}
