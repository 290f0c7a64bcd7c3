import {describe, expect, it} from 'vitest';
import {familyChartPath} from '../../src/charts/family-charts.js';

describe('familyChartPath', () => {
  it('makes a safe file name of any family name', () => {
    expect(familyChartPath('suppliers')).toBe('charts/family-suppliers');
    expect(familyChartPath('Strength / 28 days')).toBe('charts/family-strength-28-days');
    expect(familyChartPath('../x')).toBe('charts/family--x');
  });
});
