/** A confidence level as a percentage for messages: 0.95 → "95%", 0.975 → "97.5%". */
export function percent(level: number): string {
  return `${Number((level * 100).toPrecision(12))}%`;
}
