import {readFileSync} from 'node:fs';
import {it} from 'vitest';
import {noncentralChiSquareCdf, noncentralChiSquareSf} from '../../src/distributions/noncentral-chi-square.js';
import {lre} from '../helpers/lre.js';
it('scratch', () => {
  const rows = JSON.parse(readFileSync('/tmp/ref/ncx2.json', 'utf8')) as {x: number; df: number; ncp: number; cdf: number; sf: number}[];
  const worst: string[] = [];
  let min = 99;
  const t0 = performance.now();
  for (const r of rows) {
    for (const [name, f, ref] of [['cdf', noncentralChiSquareCdf, r.cdf], ['sf', noncentralChiSquareSf, r.sf]] as const) {
      if (ref < 1e-300 || ref === 1) continue;
      const v = f(r.x, r.df, r.ncp);
      const d = lre(v, ref);
      if (d < 13.5) worst.push(`${name}(${r.x}, ${r.df}, ${r.ncp}) = ${v} ref ${ref} lre ${d.toFixed(2)}`);
      min = Math.min(min, d);
    }
  }
  console.log('min', min, 'ms', performance.now() - t0, '\n' + worst.join('\n'));
});
