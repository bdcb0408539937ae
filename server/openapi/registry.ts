import { z } from 'zod';

// The API's endpoints, one entry each, with the schemas of shared/api: the OpenAPI document
// (GET /api/openapi.json) and docs/api.md are made from this list, and a test holds it to the routes
// Express serves (tests/server/openapi.test.ts).

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** One answer: its status, what it means, and the body's schema (JSON) or media type (a page, a PDF, a PNG). */
export type Answer = { description: string; schema?: z.ZodType; mediaType?: 'application/json' | 'text/html' | 'application/pdf' | 'image/png' };

export type Endpoint = {
  method: Method;
  /** OpenAPI style: /api/rigs/{rigId}. */
  path: string;
  tag: string;
  summary: string;
  /** Who may call it, in words (the access matrix test holds each role to it). */
  who: string;
  params?: z.ZodObject;
  query?: z.ZodObject;
  body?: z.ZodType;
  /** The body is multipart/form-data: a `file` beside the fields of `body`. */
  multipart?: boolean;
  responses: Record<number, Answer>;
  /** Refusals beyond the ones every endpoint of its kind has (400 bad input, 401 signed out, 404 no such rig). */
  errors?: Record<number, string>;
};

export const OPEN = 'anyone: open, stores nothing, rate-limited per address';
export const SIGNED_IN = 'any signed-in account';
export const HOUSEHOLD = 'the rig’s household: owner, member, advisor';
export const EDITORS = 'owner, member';
export const OWNER = 'owner';
export const ADMIN = 'an admin account';

export const json = (description: string, schema: z.ZodType): Answer => ({ description, schema, mediaType: 'application/json' });
export const noContent = (description = 'Done; no body.'): Answer => ({ description });
export const page = (description: string, mediaType: Answer['mediaType']): Answer => ({ description, mediaType });

/** What every refusal carries (server/middleware/error-handler.ts). */
export const problemSchema = z.strictObject({
  status: z.number().int(),
  code: z.string(),
  message: z.string(),
  fields: z.array(z.strictObject({ path: z.string(), message: z.string() })),
  retryAfterSeconds: z.number().int().optional(),
});

/** The refusals an endpoint can answer: the common ones worked out from its entry, then its own. */
export function refusalsOf(e: Endpoint): Record<number, string> {
  const out: Record<number, string> = {};
  if (e.params || e.query || e.body) out[400] = 'A field is not valid: `fields` names each one.';
  if (e.who !== OPEN && !e.path.startsWith('/api/email/') && e.path !== '/api/health' && e.path !== '/api/openapi.json') out[401] = 'Not signed in.';
  if (e.who === ADMIN) out[403] = 'Not an admin account.';
  if (e.path.includes('{rigId}')) {
    if (e.who !== HOUSEHOLD) out[403] = 'The caller’s household role may not do this.';
    out[404] = 'No such rig, or not shared with the caller.';
  }
  return { ...out, ...e.errors };
}
