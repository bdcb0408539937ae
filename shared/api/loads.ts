import { z } from 'zod';

import { loadSchema } from '../schemas/projection';

export { loadSchema } from '../schemas/projection';
export { loadParamsSchema } from '../schemas/rig';

/** A load as saved on a rig: the load, its id and who added it. */
export const savedLoadSchema = z.strictObject({
  ...loadSchema.shape,
  id: z.uuid(),
  addedBy: z.strictObject({ id: z.string(), name: z.string() }).nullable(),
});
export type SavedLoad = z.infer<typeof savedLoadSchema>;
