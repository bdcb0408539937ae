import { writeFileSync } from 'node:fs';
import { resolve } from 'node:path';

import { apiMarkdown } from '@/server/openapi/markdown';

// npm run api:doc: docs/api.md from the API's registry (server/openapi) and schemas (shared/api).
const out = resolve(import.meta.dirname, '../docs/api.md');
writeFileSync(out, apiMarkdown());
console.log(`wrote ${out}`);
