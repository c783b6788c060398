// `npm run bench`: prints the speed figures of the calculation engine (not a pass/fail test).
import { benchBridge } from './bridge.bench';
import { benchMoisture } from './moisture.bench';
import { benchSheet } from './sheet.bench';
import { initialJsLine } from './size';
import { benchSweep } from './sweep.bench';
import { benchThermal } from './thermal.bench';
import { benchWind } from './wind.bench';

interface BenchResult {
  name: string;
  medianMicros: number;
  perSecond: number;
}
/** Target median per calculation, µs (from the issues that introduced each module). */
const benches: [() => BenchResult, number][] = [
  [benchThermal, 20],
  [benchMoisture, 50],
  [benchWind, 50],
  // The compliance sheet: 250 ms.
  [benchSheet, 250_000],
];

console.log(`Skinwright benchmarks — Node ${process.version}, ${new Date().toISOString()}`);
for (const [bench, target] of benches) {
  const r = bench();
  const verdict =
    r.medianMicros <= target ? `meets target ≤ ${target} µs` : `SLOWER than target ${target} µs`;
  console.log(
    `${r.name.padEnd(48)} median ${r.medianMicros.toFixed(2).padStart(8)} µs  ${Math.round(r.perSecond).toLocaleString('en-US').padStart(10)} /s   ${verdict}`,
  );
}
for (const r of benchBridge()) {
  const verdict =
    r.medianMs <= r.targetMs ? `meets target ≤ ${r.targetMs} ms` : `SLOWER than target ${r.targetMs} ms`;
  console.log(
    `${r.name.padEnd(48)} median ${r.medianMs.toFixed(1).padStart(8)} ms (CPU ${r.medianCpuMs.toFixed(0)} ms)  ${r.cells.toLocaleString('en-US').padStart(8)} cells  ${r.iterations} iterations   ${verdict}`,
  );
}
{
  const r = benchSweep();
  const verdict =
    r.medianMs <= r.targetMs ? `meets target ≤ ${r.targetMs} ms` : `SLOWER than target ${r.targetMs} ms`;
  console.log(
    `${r.name.padEnd(48)} median ${r.medianMs.toFixed(0).padStart(8)} ms (CPU ${r.medianCpuMs.toFixed(0)} ms)  ${Math.round(
      (r.variants / r.medianMs) * 1000,
    )
      .toLocaleString('en-US')
      .padStart(10)} /s   ${verdict}`,
  );
}
console.log(initialJsLine());
