/**
 * Neumaier's compensated sum (Neumaier 1974, ZAMM 54:39, the improved
 * Kahan–Babuška algorithm): many small terms add without the drift of plain
 * summation. Shared by the series of the noncentral distributions.
 */
export class CompensatedSum {
  private total = 0;
  private compensation = 0;

  add(term: number): void {
    const next = this.total + term;
    this.compensation +=
      Math.abs(this.total) >= Math.abs(term) ? this.total - next + term : term - next + this.total;
    this.total = next;
  }

  get value(): number {
    return this.total + this.compensation;
  }
}
