import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Express } from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import type { ContractHandler } from '@/server/http/handler';
import { ENDPOINTS } from '@/server/openapi';
import { apiMarkdown } from '@/server/openapi/markdown';
import { listRoutes, servedRoutes } from './list-routes';
import { makeTestApp } from './test-app';

let ctx: Awaited<ReturnType<typeof makeTestApp>>;
beforeAll(async () => {
  ctx = await makeTestApp();
});
afterAll(async () => {
  await ctx.db.destroy();
});

/** An Express path written the OpenAPI way: /api/rigs/:rigId/ → /api/rigs/{rigId}. */
const openApiPath = (path: string) => path.replace(/\/$/, '').replace(/:(\w+)/g, '{$1}');

/** Every route Express serves under /api (better-auth's aside), as "GET /api/rigs/{rigId}". */
function expressRoutes(app: Express): string[] {
  return listRoutes(app).map((r) => openApiPath(r));
}

describe('the endpoint registry', () => {
  it('has one entry for every route Express serves, and none for a route it does not', () => {
    const registered = ENDPOINTS.map((e) => `${e.method.toUpperCase()} ${e.path}`);
    expect(new Set(registered).size).toBe(registered.length);
    expect(registered.sort()).toEqual(expressRoutes(ctx.app).sort());
  });

  it('shows the very schemas each route validates its request with and types its answer from', () => {
    const entries = new Map(ENDPOINTS.map((e) => [`${e.method.toUpperCase()} ${e.path}`, e]));
    for (const route of servedRoutes(ctx.app)) {
      const key = `${route.method} ${openApiPath(route.path)}`;
      const entry = entries.get(key)!;
      const { contract } = route.last as Partial<ContractHandler>;
      expect(contract, `${key} answers through handler()`).toBeDefined();
      expect(contract!.body, `${key} body`).toBe(entry.body);
      expect(contract!.query, `${key} query`).toBe(entry.query);
      const [status, answer] = Object.entries(entry.responses).find(([s]) => Number(s) < 300)!;
      expect(contract!.status ?? 200, `${key} status`).toBe(Number(status));
      expect(contract!.response, `${key} response`).toBe(answer.schema);
    }
  });

  it('names the path parameters each path has', () => {
    for (const e of ENDPOINTS) {
      const inPath = [...e.path.matchAll(/\{(\w+)\}/g)].map((m) => m[1]).sort();
      expect(Object.keys(e.params?.shape ?? {}).sort(), `${e.method} ${e.path}`).toEqual(inPath);
    }
  });
});

describe('GET /api/openapi.json', () => {
  it('serves OpenAPI 3.1 with every endpoint, its schemas and who may call it', async () => {
    const res = await request(ctx.app).get('/api/openapi.json').expect(200).expect('Content-Type', /json/);
    expect(res.body.openapi).toBe('3.1.0');
    const ops = Object.entries(res.body.paths as Record<string, Record<string, any>>).flatMap(([path, methods]) => Object.keys(methods).map((m) => `${m} ${path}`));
    expect(ops.sort()).toEqual(ENDPOINTS.map((e) => `${e.method} ${e.path}`).sort());
    const rig = res.body.paths['/api/rigs/{rigId}'].get;
    expect(rig['x-who']).toMatch(/owner, member, advisor/);
    expect(rig.parameters).toEqual([expect.objectContaining({ name: 'rigId', in: 'path', required: true })]);
    const props = rig.responses['200'].content['application/json'].schema.properties;
    expect(Object.keys(props)).toEqual(expect.arrayContaining(['id', 'power', 'loads', 'permissions', 'version']));
    // A request body is described as the client sends it: defaults are optional.
    const create = res.body.paths['/api/rigs'].post.requestBody.content['application/json'].schema;
    expect(create.required).toEqual(['name', 'power']);
    expect(res.body.paths['/api/rigs/{rigId}/uploads'].post.requestBody.content['multipart/form-data'].schema.properties.file).toEqual({ type: 'string', format: 'binary' });
  });
});

describe('docs/api.md', () => {
  it('is what npm run api:doc writes from the registry (run it after changing an endpoint)', () => {
    const file = readFileSync(resolve(import.meta.dirname, '../../docs/api.md'), 'utf8');
    expect(file).toBe(apiMarkdown());
  });

  it('says for each endpoint who may call it', () => {
    const md = apiMarkdown();
    for (const e of ENDPOINTS) expect(md).toContain(`### \`${e.method.toUpperCase()} ${e.path}\`\n\n${e.summary}\n\n**Who:** ${e.who}.`);
  });
});
