import { ACCOUNT_ENDPOINTS } from './endpoints-account';
import { HOUSEHOLD_ENDPOINTS } from './endpoints-household';
import { OPEN_ENDPOINTS } from './endpoints-open';
import { RIG_ENDPOINTS } from './endpoints-rigs';
import type { Endpoint } from './registry';

export type { Endpoint } from './registry';

/** Every endpoint of the API (better-auth's own under /api/auth aside). */
export const ENDPOINTS: Endpoint[] = [...OPEN_ENDPOINTS, ...ACCOUNT_ENDPOINTS, ...RIG_ENDPOINTS, ...HOUSEHOLD_ENDPOINTS];
