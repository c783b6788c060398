// `npm run bench`: prints the speed figures of the calculation engine (not a pass/fail test).
import { benchThermal } from './thermal.bench';

const targets: Record<string, number> = { 'thermal: 10 layers, 3 bridge types': 20 };
const results = [benchThermal()];

console.log(`Skinwright benchmarks — Node ${process.version}, ${new Date().toISOString()}`);
for (const r of results) {
  const target = targets[r.name];
  const verdict =
    target === undefined
      ? ''
      : r.medianMicros <= target
        ? `meets target ≤ ${target} µs`
        : `SLOWER than target ${target} µs`;
  console.log(
    `${r.name.padEnd(40)} median ${r.medianMicros.toFixed(2).padStart(8)} µs   ${Math.round(r.perSecond).toLocaleString('en-US').padStart(10)} /s   ${verdict}`,
  );
}
