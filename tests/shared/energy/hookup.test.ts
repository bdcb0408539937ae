import { describe, expect, it } from 'vitest';

import { planHookup } from '@/shared/energy/hookup/plan';
import { socketOverloadWarning } from '@/shared/energy/hookup/socket';
import { project } from '@/shared/energy/project';
import { hookupInputSchema } from '@/shared/schemas/hookup';
import { projectionInputSchema } from '@/shared/schemas/projection';

/** A 12 V, 100 Ah AGM house battery with one inverter at 90 % efficiency. */
const rig = (inverter: Record<string, unknown>, options: Record<string, unknown> = {}) =>
  hookupInputSchema.parse({
    systemVoltage: 12,
    battery: { chemistry: 'agm', capacityAh: 100 },
    inverter: { efficiencyPercent: 90, idleA: 0.5, ...inverter },
    ...options,
  });
const part = (plan: ReturnType<typeof planHookup>, kind: string) => plan.parts.find((p) => p.kind === kind);

describe('a 1000 W inverter on an ignition relay, 2 m feed with a cable return', () => {
  const plan = planHookup(rig({ ratedW: 1000, control: 'ignition-relay' }, { feedLengthM: 2 }));

  it('draws 105.8 A at full output near its cut-out, 132.3 A counted as continuous', () => {
    // REFERENCES, Inverters: DC current = W / (V × efficiency), at the 10.5 V cut-out (common practice):
    // 1000 / (10.5 × 0.90) = 105.82 A. NEC 210.20(A): 125 % of a continuous load = 132.28 A.
    expect(plan.feed.currentA).toBeCloseTo(105.82, 2);
    expect(plan.feed.continuousA).toBeCloseTo(132.28, 2);
  });

  it('fuses at 150 A, the smallest standard rating above 132.3 A, at the battery', () => {
    // NEC 240.6(A) standard ratings: ... 125, 150 ...; 33 CFR 183.455: within 7 in, or 40 in sheathed.
    expect(plan.feed.fuseA).toBe(150);
    const protection = part(plan, 'protection')!;
    expect(protection.ratingA).toBe(150);
    expect(protection.notes.join(' ')).toMatch(/7 in .*40 in/);
    expect(protection.notes.join(' ')).toMatch(/type I\)/);
  });

  it('runs 2 AWG both ways: 2.25 % drop over 4 m, where 4 AWG would drop 3.56 %', () => {
    // NEC Chapter 9 Table 8 at 75 °C: 2 AWG 0.194 Ω/kft: 105.82 A × 0.194 × 4 m / 304.8 = 0.2694 V = 2.245 % of 12 V;
    // 4 AWG 0.308 Ω/kft gives 3.56 %, over ABYC E-11's 3 % for critical circuits.
    expect(plan.feed.awg).toBe('2');
    expect(plan.feed.dropPercent).toBeCloseTo(2.245, 2);
    // 33 CFR 183.425 Table 5: 2 AWG at 105 °C carries 210 A; 150 A is within its 150 % (315 A).
    expect(part(plan, 'conductor')!.ratingA).toBe(210);
    expect(part(plan, 'return')!.label).toMatch(/^2 AWG/);
  });

  it('needs a continuous-duty solenoid: 150 A is beyond a 30 or 40 A automotive relay', () => {
    // REFERENCES, Inverters and their switching: ISO 280/mini relays carry 30 or 40 A (common practice).
    const relay = part(plan, 'relay')!;
    expect(relay.label).toMatch(/Continuous-duty solenoid/);
    expect(relay.ratingA).toBe(150);
    expect(plan.warnings.map((w) => w.code)).toContain('relay-contacts-too-small');
    // Solenoid coil about 1 A (from memory): its fuse the smallest blade above 1.25 A, 2 A (ISO 8820-3 series, common practice).
    expect(part(plan, 'coil-fuse')!.ratingA).toBe(2);
  });

  it('switches the remote on/off input with a 30 A relay instead, where the inverter has one', () => {
    const remote = planHookup(rig({ ratedW: 1000, control: 'ignition-relay' }, { feedLengthM: 2, remoteOnOff: true }));
    expect(part(remote, 'remote-switch')!.ratingA).toBe(30);
    expect(part(remote, 'relay')).toBeUndefined();
    // Relay coil about 0.15 A (from memory): 125 % is 0.19 A, so the 1 A blade fuse.
    expect(part(remote, 'coil-fuse')!.ratingA).toBe(1);
  });

  it('puts a 200 W inverter on an ordinary 30 A relay', () => {
    // 200 / 9.45 = 21.16 A; × 1.25 = 26.46 A; fuse 30 A (NEC 240.6(A)); contacts 30 A (common practice).
    const small = planHookup(rig({ ratedW: 200, control: 'ignition-relay' }, { feedLengthM: 1 }));
    expect(small.feed.fuseA).toBe(30);
    expect(part(small, 'relay')!.label).toBe('Ignition relay, 30 A contacts');
  });
});

describe('a 300 W plug-in inverter on a 15 A accessory socket', () => {
  const plan = planHookup(rig({ ratedW: 300, control: 'always-on', connection: 'socket', socketFuseA: 15, socketSwitched: false }));

  it('draws 31.7 A at full output, more than the socket fuse: about 141 W is the limit there', () => {
    // 300 / (10.5 × 0.9) = 31.75 A; 15 A × 10.5 V × 0.9 = 141.75 W, inside the usual 120 to 150 W for a
    // plug-in inverter on an SAE J563 socket (REFERENCES, common practice).
    expect(plan.feed.currentA).toBeCloseTo(31.75, 2);
    expect(plan.feed.fuseA).toBe(15);
    const w = plan.warnings.find((x) => x.code === 'socket-fuse-below-inverter')!;
    expect(w.message).toContain('141 W');
  });

  it('draws the socket, its fuse and the vehicle return, and warns that an always-live socket drains the battery', () => {
    expect(plan.parts.map((p) => p.kind)).toEqual(['battery', 'protection', 'socket', 'conductor', 'inverter', 'return']);
    expect(part(plan, 'socket')!.label).toMatch(/always live/);
    expect(plan.warnings.map((w) => w.code)).toContain('socket-always-live');
    const switched = planHookup(rig({ ratedW: 300, connection: 'socket', socketSwitched: true }));
    expect(switched.warnings.map((w) => w.code)).not.toContain('socket-always-live');
  });

  it('lets POST /api/projections warn when scheduled AC loads exceed the socket fuse', () => {
    const input = projectionInputSchema.parse({
      battery: { chemistry: 'agm', capacityAh: 100 },
      inverter: { ratedW: 300, efficiencyPercent: 90, idleA: 0.5, connection: 'socket', socketFuseA: 15 },
      loads: [{ name: 'Kettle', supply: 'ac', watts: 250, hoursPerDay: 1, startHour: 8 }],
    });
    // 250 / (12 × 0.9) + 0.5 = 23.6 A through a 15 A fuse.
    expect(project(input).warnings.map((w) => w.code)).toContain('socket-fuse-exceeded');
    expect(socketOverloadWarning(input, 100)).toBeNull(); // 100 / 10.8 + 0.5 = 9.8 A
  });
});

describe('a 2000 W inverter on a switching breaker, 2.5 m feed', () => {
  const plan = planHookup(rig({ ratedW: 2000, control: 'manual-switch' }, { feedLengthM: 2.5 }));

  it('draws 211.6 A; 264.6 A continuous takes a 300 A type III switching breaker at the battery', () => {
    // 2000 / 9.45 = 211.64 A; × 1.25 = 264.55 A (NEC 210.20(A)); 300 A is the next NEC 240.6(A) rating
    // (250 and 300 lie beyond the excerpt in REFERENCES: from memory of the same table).
    expect(plan.feed.currentA).toBeCloseTo(211.64, 2);
    const breaker = part(plan, 'switching-breaker')!;
    expect(breaker.ratingA).toBe(300);
    expect(breaker.label).toMatch(/SAE J553 type III/);
    expect(part(plan, 'switch')).toBeUndefined();
  });

  it('runs 2/0 AWG: 2.80 % over 5 m of conductor, where 1/0 would drop 3.53 %', () => {
    // NEC Table 8 at 75 °C: 2/0 0.0967 Ω/kft: 211.64 A × 0.0967 × 5 m / 304.8 = 0.3357 V = 2.80 % of 12 V;
    // 1/0 0.122 Ω/kft gives 3.53 %, over ABYC E-11's 3 %. Its Table 5 amps (330 A at 105 °C) are from memory.
    expect(plan.feed.awg).toBe('2/0');
    expect(plan.feed.dropPercent).toBeCloseTo(2.798, 2);
    expect(part(plan, 'conductor')!.ratingA).toBe(330);
  });

  it('gives no size when the metric table ends first: 95 mm² drops 3.5 % over 8 m', () => {
    // IEC 60228 class 5 95 mm² 0.206 Ω/km at 20 °C is 0.2505 at 75 °C: 211.64 A × 8 m × 0.2505 mΩ = 0.424 V, 3.5 %.
    const long = planHookup(rig({ ratedW: 2000, control: 'manual-switch' }, { feedLengthM: 4 }));
    expect(long.feed.awg).toBeNull();
    expect(long.feed.fuseA).toBe(300);
    expect(long.warnings.map((w) => w.code)).toContain('feed-too-heavy');
  });

  it('uses a fuse at the battery and a separate 300 A switch where the switch sits elsewhere', () => {
    const split = planHookup(rig({ ratedW: 2000, control: 'manual-switch' }, { feedLengthM: 2.5, switchAt: 'elsewhere' }));
    expect(part(split, 'protection')!.ratingA).toBe(300);
    expect(part(split, 'switch')!.ratingA).toBe(300);
  });
});

describe('a 2000 W inverter on a low-voltage disconnect', () => {
  const plan = planHookup(rig({ ratedW: 2000, control: 'low-voltage-disconnect', lvdSocPercent: 60 }, { feedLengthM: 2.5 }));

  it('rates the disconnect for the 300 A protection and names its set point', () => {
    const lvd = part(plan, 'low-voltage-disconnect')!;
    expect(lvd.ratingA).toBe(300);
    expect(lvd.label).toContain('60 %');
    expect(plan.parts.map((p) => p.kind)).toEqual(['battery', 'protection', 'low-voltage-disconnect', 'conductor', 'inverter', 'return']);
  });

  it('defaults the set point to the model\'s: the AGM cut-off of 50 % plus 10 points (model choice)', () => {
    const d = planHookup(rig({ ratedW: 2000, control: 'low-voltage-disconnect' }, { feedLengthM: 2.5 }));
    expect(part(d, 'low-voltage-disconnect')!.label).toContain('60 %');
  });

  it('with a chassis return draws no negative cable and asks for the ground-point check', () => {
    const chassis = planHookup(rig({ ratedW: 2000, control: 'low-voltage-disconnect' }, { feedLengthM: 2, returnPath: 'chassis' }));
    expect(part(chassis, 'return')!.label).toBe('Chassis return');
    expect(part(chassis, 'return')!.notes.join(' ')).toMatch(/ground point/);
  });
});

describe('every plan', () => {
  it('carries the cautions, the maker\'s instructions first', () => {
    const plan = planHookup(rig({ ratedW: 300 }));
    expect(plan.cautions[0]).toMatch(/maker's own fuse/);
    expect(plan.cautions.join(' ')).toMatch(/qualified auto electrician/);
  });

  it('says when no single cable carries the feed', () => {
    const plan = planHookup(rig({ ratedW: 10_000 }, { feedLengthM: 10 }));
    expect(plan.feed.awg).toBeNull();
    expect(plan.warnings.map((w) => w.code)).toContain('feed-too-heavy');
  });
});
