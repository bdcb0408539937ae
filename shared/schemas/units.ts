import { z } from 'zod';

import { ENERGY_UNITS } from '../units';
import './error-map';

/** PUT /api/me/units: the person's energy unit, kept on the account so their e-mails use it too. */
export const unitsSchema = z.strictObject({
  energy: z.enum(ENERGY_UNITS, { error: 'Choose Ah or Wh.' }),
});
export type UnitsBody = z.infer<typeof unitsSchema>;
