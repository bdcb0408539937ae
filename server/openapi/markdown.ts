import { jsonSchemaOf } from './document';
import { ENDPOINTS } from './index';
import { type Endpoint, refusalsOf } from './registry';

// docs/api.md, written by `npm run api:doc` from the registry: per endpoint its method, path, who may call
// it, the request's fields and each answer's fields. A test fails when the file is not what this makes.

type Js = { type?: string | string[]; enum?: unknown[]; const?: unknown; anyOf?: Js[]; oneOf?: Js[]; items?: Js; prefixItems?: Js[]; properties?: Record<string, Js>; required?: string[]; additionalProperties?: Js | boolean; format?: string; default?: unknown; minimum?: number; maximum?: number; exclusiveMinimum?: number };
type Row = { name: string; type: string; required: boolean; note: string };

const MAX_DEPTH = 3;
const variants = (s: Js) => s.anyOf ?? s.oneOf ?? null;

function typeOf(s: Js): string {
  if (s.const !== undefined) return JSON.stringify(s.const);
  if (s.enum) return s.enum.map((v) => JSON.stringify(v)).join(' \\| ');
  const vs = variants(s);
  if (vs) return [...new Set(vs.map(typeOf))].join(' \\| ');
  if (s.type === 'array') return s.prefixItems ? `[${s.prefixItems.map(typeOf).join(', ')}]` : `${s.items ? typeOf(s.items) : 'any'}[]`;
  if (s.type === 'object' || s.properties) return s.properties ? 'object' : 'map';
  if (Array.isArray(s.type)) return s.type.join(' \\| ');
  if (s.type) return s.format ? `${s.type} (${s.format})` : s.type;
  return 'any';
}

function noteOf(s: Js): string {
  const parts: string[] = [];
  const lo = s.minimum ?? s.exclusiveMinimum;
  if (lo !== undefined && s.maximum !== undefined) parts.push(`${s.exclusiveMinimum !== undefined ? 'over ' : ''}${lo} to ${s.maximum}`);
  if (s.default !== undefined) parts.push(`default ${JSON.stringify(s.default)}`);
  return parts.join('; ');
}

/** The object inside a schema (itself, an array's items, or the non-null side of a nullable), if any. */
function objectIn(s: Js): Js | null {
  if (s.properties) return s;
  if (s.type === 'array' && s.items) return objectIn(s.items);
  const vs = variants(s);
  if (vs) {
    const objects = vs.map(objectIn).filter((x): x is Js => x !== null);
    if (objects.length === 1) return objects[0];
    if (objects.length > 1) return { properties: Object.assign({}, ...objects.map((o) => o.properties)), required: [] };
  }
  return null;
}

function rowsOf(s: Js, prefix = '', depth = 0): Row[] {
  const obj = objectIn(s);
  if (!obj?.properties) return [];
  const rows: Row[] = [];
  for (const [key, child] of Object.entries(obj.properties)) {
    const name = prefix + key + (child.type === 'array' ? '[]' : '');
    rows.push({ name, type: typeOf(child), required: (obj.required ?? []).includes(key), note: noteOf(child) });
    if (depth + 1 < MAX_DEPTH) rows.push(...rowsOf(child, `${name}.`, depth + 1));
  }
  return rows;
}

function table(rows: Row[], withRequired: boolean): string[] {
  if (!rows.length) return [];
  const head = withRequired ? ['| field | type | required | note |', '|---|---|---|---|'] : ['| field | type |', '|---|---|'];
  return [...head, ...rows.map((r) => (withRequired ? `| \`${r.name}\` | ${r.type} | ${r.required ? 'yes' : ''} | ${r.note} |` : `| \`${r.name}\` | ${r.type} |`)), ''];
}

function section(e: Endpoint): string[] {
  const out = [`### \`${e.method.toUpperCase()} ${e.path}\``, '', e.summary, '', `**Who:** ${e.who}.`, ''];
  if (e.params) out.push('**Path:** ' + rowsOf(jsonSchemaOf(e.params, 'input') as Js).map((r) => `\`${r.name}\` ${r.type}`).join(', ') + '.', '');
  if (e.query) out.push('**Query:**', '', ...table(rowsOf(jsonSchemaOf(e.query, 'input') as Js), true));
  if (e.body || e.multipart) {
    out.push(e.multipart ? '**Body** (multipart/form-data: `file`, and these fields):' : '**Body** (JSON):', '');
    if (e.body) out.push(...table(rowsOf(jsonSchemaOf(e.body, 'input') as Js), true));
  }
  for (const [status, a] of Object.entries(e.responses)) {
    out.push(`**${status}** ${a.description}${a.mediaType && a.mediaType !== 'application/json' ? ` (${a.mediaType})` : ''}`, '');
    if (a.schema) out.push(...table(rowsOf(jsonSchemaOf(a.schema, 'output') as Js), false));
  }
  const refusals = Object.entries(refusalsOf(e));
  if (refusals.length) out.push('**Refused:** ' + refusals.map(([s, d]) => `${s} ${d}`).join(' '), '');
  return out;
}

export function apiMarkdown(): string {
  const tags = [...new Set(ENDPOINTS.map((e) => e.tag))];
  const lines = [
    '# The API',
    '',
    '<!-- Written by `npm run api:doc` from server/openapi and shared/api; do not edit by hand. -->',
    '',
    'Every endpoint, who may call it, what it takes and what it answers. The same list is served as OpenAPI 3.1 at',
    '`GET /api/openapi.json`. Conventions, the error shape, sign-in and the model’s answer explained are in',
    '[api-notes.md](api-notes.md). Fields deeper than three levels are in the OpenAPI document.',
    '',
    ...tags.map((t) => `- [${t}](#${t.replace(/ /g, '-')})`),
    '',
  ];
  for (const tag of tags) {
    lines.push(`## ${tag}`, '');
    for (const e of ENDPOINTS.filter((x) => x.tag === tag)) lines.push(...section(e));
  }
  return lines.join('\n').replace(/\n{3,}/g, '\n\n').trimEnd() + '\n';
}
