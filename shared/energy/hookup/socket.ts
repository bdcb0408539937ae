import type { ProjectionInput } from '../../schemas/projection';
import { cutOutVoltage, feedCurrentA } from './feed';

type Inverter = NonNullable<ProjectionInput['inverter']>;

const r1 = (x: number) => Math.round(x * 10) / 10;

/** The most AC watts a socket's fuse lets through at the inverter's cut-out: fuse × 10.5 V × efficiency. */
export function socketLimitW(inverter: Inverter, systemVoltage: number): number {
  return inverter.socketFuseA * cutOutVoltage(systemVoltage) * (inverter.efficiencyPercent / 100);
}

/**
 * The projection's check for a plug-in inverter: the AC loads scheduled together, drawn through the socket
 * at the system voltage (watts / (V × efficiency), plus the idle current), against the socket's fuse.
 */
export function socketOverloadWarning(input: ProjectionInput, maxAcWatts: number): { code: string; message: string } | null {
  const inv = input.inverter;
  if (!inv || inv.connection !== 'socket' || maxAcWatts <= 0) return null;
  const drawA = maxAcWatts / (input.systemVoltage * (inv.efficiencyPercent / 100)) + inv.idleA;
  if (drawA <= inv.socketFuseA) return null;
  return {
    code: 'socket-fuse-exceeded',
    message: `AC loads scheduled together draw about ${r1(drawA)} A through the accessory socket, more than its ${inv.socketFuseA} A fuse: the fuse will blow. Run fewer at once or wire the inverter to the battery.`,
  };
}

/** Plan-level warnings for a plug-in inverter: its own rating against the socket, and a socket left live. */
export function socketPlanWarnings(input: ProjectionInput): { code: string; message: string }[] {
  const inv = input.inverter!;
  const out: { code: string; message: string }[] = [];
  const fullA = feedCurrentA(inv.ratedW, inv.efficiencyPercent, input.systemVoltage);
  if (fullA > inv.socketFuseA) {
    out.push({
      code: 'socket-fuse-below-inverter',
      message: `At its rated ${inv.ratedW} W the inverter draws up to ${r1(fullA)} A near its cut-out, more than the socket's ${inv.socketFuseA} A fuse: on this socket use at most about ${Math.floor(socketLimitW(inv, input.systemVoltage))} W of AC, or wire it directly to the battery. Never fit a bigger fuse in the socket's place.`,
    });
  }
  if (!inv.socketSwitched) {
    const battery = input.battery.role === 'starter' ? 'the starting battery' : 'the battery';
    out.push({
      code: 'socket-always-live',
      message: `This socket stays live with the key out: the plugged-in inverter's ${inv.idleA} A idle draw runs ${battery} down while parked. Unplug it, or use a socket that is live only with the ignition.`,
    });
  }
  return out;
}
