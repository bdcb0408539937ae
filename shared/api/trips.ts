import { z } from 'zod';

import { tripSchema } from '../schemas/trip';

export { tripParamsSchema, tripSchema } from '../schemas/trip';
export { tripOutlookAnswerSchema, type TripOutlookAnswer } from './rigs';

/** A saved trip: the plan as the trip schema gives it back, and its id. */
export const savedTripSchema = tripSchema.safeExtend({ id: z.uuid() });
export type SavedTrip = z.infer<typeof savedTripSchema>;

/** A stay's place from the rig's trips, to start a new stay from. */
export const recentPlaceSchema = z.strictObject({ name: z.string(), latitudeDeg: z.number(), elevationM: z.number().optional() });
export type RecentPlace = z.infer<typeof recentPlaceSchema>;

/** GET /api/rigs/:rigId/trips */
export const tripListSchema = z.strictObject({ trips: z.array(savedTripSchema), recentPlaces: z.array(recentPlaceSchema) });
export type TripList = z.infer<typeof tripListSchema>;
