export { compareInputSchema, projectionInputSchema } from '../schemas/projection';
/** POST /api/projections and POST /api/projections/compare. */
export { comparisonSchema, projectionSchema } from './model';
