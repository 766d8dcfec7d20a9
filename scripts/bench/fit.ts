/**
 * bench:fit — fits per second for a full fit with all statistics (fitPolynomial), for n ∈ {22, 200, 2000} and
 * m ∈ {2, 5, 10}, with and without the exact rational certification, on data typed with 6 significant digits
 * (as measured tables are) and on full 17-digit doubles (the worst case for the exact path).
 * Prints figures only; nothing here asserts a time. Run: npm run bench:fit
 */
import { fitPolynomial } from '../../src/core/index.ts';

function makeData(n: number, digits: number | null) {
  let state = 12345;
  const random = () => ((state = (state * 1103515245 + 12345) % 2147483648) / 2147483648);
  const x = Array.from({ length: n }, (_, i) => 250 + (650 * i) / (n - 1));
  const y = x.map((t) => 0.4 + 0.3 * Math.exp(-700 / t) + 1e-3 * (random() - 0.5));
  const round = (v: number) => (digits === null ? v : Number(v.toPrecision(digits)));
  return { x: x.map(round), y: y.map(round) };
}

function measure(run: () => void, minimumMs = 400): number {
  run(); // warm-up
  let count = 0;
  const start = performance.now();
  let elapsed = 0;
  while (elapsed < minimumMs) {
    run();
    count++;
    elapsed = performance.now() - start;
  }
  return (count * 1000) / elapsed;
}

// Warm the JIT on every code path before measuring anything.
for (const n of [22, 200]) for (const m of [2, 5, 10]) for (let i = 0; i < 20; i++) fitPolynomial(makeData(n, 6), { order: m });

const rows: string[] = [];
rows.push('| data | n | m | fits/s (exact certification) | fits/s (floating point only) | ratio |');
rows.push('|---|---:|---:|---:|---:|---:|');
for (const digits of [6, null]) {
  for (const n of [22, 200, 2000]) {
    const data = makeData(n, digits);
    for (const m of [2, 5, 10]) {
      const exact = measure(() => fitPolynomial(data, { order: m }));
      const float = measure(() => fitPolynomial(data, { order: m, exact: 'off' }));
      rows.push(`| ${digits === null ? '17-digit doubles' : `${digits} significant digits`} | ${n} | ${m} | ${exact.toFixed(0)} | ${float.toFixed(0)} | ${(float / exact).toFixed(1)} |`);
    }
  }
}
console.log(`node ${process.version}, ${new Date().toISOString()}`);
console.log(rows.join('\n'));
