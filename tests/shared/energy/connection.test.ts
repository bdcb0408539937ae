import { describe, expect, it } from 'vitest';

import { project } from '@/shared/energy/project';
import { WREN } from '@/shared/demo/scenario';
import { projectionInputSchema } from '@/shared/schemas/projection';

const wren = (inverter: object) => projectionInputSchema.parse({ ...WREN, inverter: { ...WREN.inverter, ...inverter } });

describe('how the inverter is connected', () => {
  it('in a socket live only with the ignition, it is powered only while driving, as on an ignition relay', () => {
    const socket = project(wren({ connection: 'socket', socketSwitched: true, control: 'always-on' }), { fixes: false });
    const relay = project(wren({ control: 'ignition-relay' }), { fixes: false });
    expect(socket.parked.daysToCutoff).toBe(relay.parked.daysToCutoff);
    expect(socket.daily).toEqual(relay.daily);
  });

  it('in a socket that is always live, or wired to the battery, it follows its own switching', () => {
    const live = project(wren({ connection: 'socket', socketSwitched: false }), { fixes: false });
    const wired = project(wren({ connection: 'direct' }), { fixes: false });
    const plain = project(wren({}), { fixes: false });
    expect(live.parked).toEqual(plain.parked);
    expect(wired.parked).toEqual(plain.parked);
  });
});
