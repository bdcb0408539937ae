import { z } from 'zod';

import { ENDPOINTS } from './index';
import { type Endpoint, problemSchema, refusalsOf } from './registry';

type JsonSchema = Record<string, unknown>;

/** JSON Schema (2020-12, as OpenAPI 3.1 takes it) of a request part (as sent) or an answer (as received). */
export function jsonSchemaOf(schema: z.ZodType, io: 'input' | 'output'): JsonSchema {
  const { $schema: _s, ...rest } = z.toJSONSchema(schema, { io, unrepresentable: 'any', target: 'draft-2020-12' }) as JsonSchema;
  return rest;
}

function parametersOf(e: Endpoint) {
  const out: JsonSchema[] = [];
  const add = (where: 'path' | 'query', schema: z.ZodObject | undefined) => {
    if (!schema) return;
    const js = jsonSchemaOf(schema, 'input') as { properties?: Record<string, JsonSchema>; required?: string[] };
    for (const [name, s] of Object.entries(js.properties ?? {})) {
      out.push({ name, in: where, required: where === 'path' || (js.required ?? []).includes(name), schema: s });
    }
  };
  add('path', e.params);
  add('query', e.query);
  return out;
}

function operationOf(e: Endpoint) {
  const responses: Record<string, unknown> = {};
  for (const [status, a] of Object.entries(e.responses)) {
    responses[status] = {
      description: a.description,
      ...(a.mediaType ? { content: { [a.mediaType]: a.schema ? { schema: jsonSchemaOf(a.schema, 'output') } : {} } } : {}),
    };
  }
  for (const [status, description] of Object.entries(refusalsOf(e))) {
    responses[status] = { description, content: { 'application/json': { schema: { $ref: '#/components/schemas/Problem' } } } };
  }
  const media = e.multipart ? 'multipart/form-data' : 'application/json';
  const body = e.body ? jsonSchemaOf(e.body, 'input') : e.multipart ? { type: 'object', properties: {} } : null;
  if (body && e.multipart) (body as { properties: JsonSchema }).properties = { ...(body.properties as JsonSchema), file: { type: 'string', format: 'binary' } };
  return {
    summary: e.summary,
    description: `Who may call it: ${e.who}.`,
    tags: [e.tag],
    'x-who': e.who,
    ...(e.params || e.query ? { parameters: parametersOf(e) } : {}),
    ...(body ? { requestBody: { required: true, content: { [media]: { schema: body } } } } : {}),
    responses,
  };
}

/** The OpenAPI 3.1 document of the API, made from the registry and the schemas of shared/api. */
export function openApiDocument(version: string) {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const e of ENDPOINTS) (paths[e.path] ??= {})[e.method] = operationOf(e);
  return {
    openapi: '3.1.0',
    info: {
      title: 'Keyoff API',
      version,
      description: 'A vehicle’s 12 V electrical budget. Conventions, the error shape and the model’s answer explained: docs/api-notes.md.',
    },
    servers: [{ url: '/' }],
    paths,
    components: {
      schemas: { Problem: jsonSchemaOf(problemSchema, 'output') },
      securitySchemes: { session: { type: 'apiKey', in: 'cookie', name: 'better-auth.session_token' } },
    },
  };
}
