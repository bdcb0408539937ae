export { healthSchema, type Health } from '../schemas/health';
