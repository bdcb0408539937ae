// npm run bench: the energy model's speed on one core, for 5, 40 and 200 loads: a plain 14-day hourly
// projection (target under 100 µs for 40 loads) and one with its Fixes (target under 2 ms for 40 loads).
import { project } from '@/shared/energy/project';
import { WREN } from '@/shared/demo/scenario';
import { type LoadInput, projectionInputSchema } from '@/shared/schemas/projection';
import { record } from './bench-results';

const kinds: LoadInput[] = [
  { name: 'Fridge', supply: 'dc', watts: 45, dutyPercent: 35, hoursPerDay: 24 },
  { name: 'Lights', supply: 'dc', watts: 8, hoursPerDay: 4, startHour: 19, when: 'parked' },
  { name: 'Fan', supply: 'dc', watts: 20, dutyPercent: 50, hoursPerDay: 8, startHour: 22 },
  { name: 'Laptop', supply: 'ac', watts: 60, dutyPercent: 70, hoursPerDay: 3, startHour: 14, when: 'parked' },
  { name: 'Pump', supply: 'dc', amps: 4, hoursPerDay: 0.3, startHour: 8, weekdays: [0, 2, 4] },
];
const rigWith = (n: number) => {
  const scale = n / 5;
  const loads = Array.from({ length: n }, (_, i) => {
    const k = kinds[i % kinds.length];
    return { ...k, name: `${k.name} ${i + 1}`, watts: k.watts && k.watts / scale, amps: k.amps && k.amps / scale };
  });
  return projectionInputSchema.parse({ ...WREN, loads, horizonDays: 14, battery: { ...WREN.battery, capacityAh: 200 } });
};

function time(fn: () => void, runs: number) {
  // Warm-up long enough for the optimizing compiler to settle on the code it keeps.
  for (let i = 0; i < Math.max(1000, runs); i++) fn();
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = process.hrtime.bigint();
    fn();
    samples.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  samples.sort((a, b) => a - b);
  return { medianMs: +samples[Math.floor(runs / 2)].toFixed(4), p95Ms: +samples[Math.floor(runs * 0.95)].toFixed(4), runs };
}

const out: Record<string, unknown> = {};
for (const n of [5, 40, 200]) {
  const rig = rigWith(n);
  const plain = time(() => project(rig, { fixes: false }), n === 200 ? 300 : 2000);
  const fixes = time(() => project(rig), n === 200 ? 100 : 500);
  out[`${n} loads`] = { plain, withFixes: fixes };
  console.log(`model, ${String(n).padStart(3)} loads, 14 days hourly: plain median ${(plain.medianMs * 1000).toFixed(0)} µs (p95 ${(plain.p95Ms * 1000).toFixed(0)}), with Fixes median ${fixes.medianMs.toFixed(2)} ms (p95 ${fixes.p95Ms.toFixed(2)})`);
}
const forty = out['40 loads'] as { plain: { medianMs: number }; withFixes: { medianMs: number } };
console.log(`targets (40 loads): plain under 100 µs: ${forty.plain.medianMs < 0.1 ? 'met' : 'missed'}; with Fixes under 2 ms: ${forty.withFixes.medianMs < 2 ? 'met' : 'missed'}`);
record('model', out);
