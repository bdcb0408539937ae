// npm run bench: the energy model's speed. Target: a 14-day hourly projection of a rig with 40 loads,
// Fixes included, in under 2 ms on one core. Prints the median and the 95th percentile.
import { project } from '@/shared/energy/project';
import { WREN } from '@/shared/demo/scenario';
import { type LoadInput, projectionInputSchema } from '@/shared/schemas/projection';

const kinds: LoadInput[] = [
  { name: 'Fridge', supply: 'dc', watts: 45, dutyPercent: 35, hoursPerDay: 24 },
  { name: 'Lights', supply: 'dc', watts: 8, hoursPerDay: 4, startHour: 19, when: 'parked' },
  { name: 'Fan', supply: 'dc', watts: 20, dutyPercent: 50, hoursPerDay: 8, startHour: 22 },
  { name: 'Laptop', supply: 'ac', watts: 60, dutyPercent: 70, hoursPerDay: 3, startHour: 14, when: 'parked' },
  { name: 'Pump', supply: 'dc', amps: 4, hoursPerDay: 0.3, startHour: 8, weekdays: [0, 2, 4] },
];
const loads = Array.from({ length: 40 }, (_, i) => ({ ...kinds[i % kinds.length], name: `${kinds[i % kinds.length].name} ${i + 1}`, watts: kinds[i % kinds.length].watts && kinds[i % kinds.length].watts! / 8, amps: kinds[i % kinds.length].amps && kinds[i % kinds.length].amps! / 8 }));
const rig = projectionInputSchema.parse({ ...WREN, loads, horizonDays: 14, battery: { ...WREN.battery, capacityAh: 200 } });

function time(label: string, fn: () => void, runs: number) {
  for (let i = 0; i < 50; i++) fn(); // warm-up
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = process.hrtime.bigint();
    fn();
    samples.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  samples.sort((a, b) => a - b);
  const median = samples[Math.floor(runs / 2)];
  const p95 = samples[Math.floor(runs * 0.95)];
  console.log(`${label.padEnd(48)} median ${median.toFixed(3)} ms   p95 ${p95.toFixed(3)} ms   (${runs} runs)`);
  return median;
}

const withFixes = project(rig);
console.log(`rig: ${rig.loads.length} loads, ${rig.horizonDays} days hourly; ${withFixes.fixes.length} Fixes found: ${withFixes.fixes.map((f) => f.kind).join(', ')}`);
time('projection, 40 loads, 14 days, Fixes included', () => project(rig), 500);
time('projection, 40 loads, 14 days, no Fixes', () => project(rig, { fixes: false }), 1000);
const median = time('parse + projection with Fixes (as the API does)', () => project(projectionInputSchema.parse({ ...WREN, loads })), 500);
console.log(median < 2 ? 'target met: under 2 ms' : 'target missed: 2 ms');
