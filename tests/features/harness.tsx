import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, renderHook } from '@testing-library/react';
import { File as NodeFile } from 'node:buffer';
import { type ChildProcess, spawn } from 'node:child_process';
import { once } from 'node:events';
import { createInterface } from 'node:readline';
import { fileURLToPath } from 'node:url';
import path from 'node:path';
import type { ReactNode } from 'react';
import { afterAll, afterEach, beforeAll, vi } from 'vitest';

import { PASSWORD } from '../server/helpers';
import { TEST_ORIGIN } from '../server/test-app';
import type { ServedHousehold } from './household-server';

// A file path (jsdom's URL is not the one node:url takes).
const HERE = path.dirname(fileURLToPath(import.meta.url));

/** Who the browser is signed in as: one of the household's people (see householdFixture). */
export type Person = keyof ServedHousehold['users'];

/**
 * A fresh QueryClient, as the app makes one (features/shell/components/app-providers.tsx: nothing waits on
 * the browser's online flag), but with no retries, so a refusal is an answer at once, and with nothing kept
 * once no hook reads it.
 */
export function freshQueryClient() {
  return new QueryClient({
    defaultOptions: {
      queries: { retry: false, gcTime: 0, networkMode: 'always' },
      mutations: { retry: false, gcTime: 0, networkMode: 'always' },
    },
  });
}

/**
 * The hooks against the real app: makeTestApp's app with a household of its own (householdFixture: an
 * owner, member, advisor, outsider and admin, and the owner's rig `fx.rigId`), served over HTTP on an
 * ephemeral port by tests/features/household-server.ts in a Node process of its own, with
 * EXPO_PUBLIC_API_URL pointing at it and a fetch that does what the browser does for the app (keeps each
 * person's cookies, sends Keyoff's Origin). Each person signs in through the real /api/auth/sign-in/email.
 * Features' api modules read the API's address when they load, so a test file takes them through `load`,
 * never a static import:
 *
 *     const api = withApiHooks();
 *     const notes = api.load(() => import('@/features/notes/api/notes'));
 *     it('...', async () => {
 *       const { result, client } = api.render(() => notes.useNotesQuery(api.fx.rigId), 'member');
 *     });
 *
 * Every `render` makes a fresh QueryClient; the hooks it rendered are unmounted after each test. The
 * server runs outside this process because jsdom's globals (its typed arrays among them) break the
 * server's libraries: in-process, better-auth could not sign its e-mail verification tokens.
 */
export function withApiHooks(env: Record<string, string> = {}) {
  if (typeof document === 'undefined') throw new Error('a hook test runs under jsdom: start its file with // @vitest-environment jsdom');
  const fx = {} as ServedHousehold;
  const jars = new Map<Person, Map<string, string>>();
  const nodeFetch = globalThis.fetch;
  const loaders: (() => Promise<void>)[] = [];
  let server: ChildProcess | undefined;
  let base = '';
  let signedIn: Person | null = null;

  /** The browser's fetch for the app's pages: cookies and Origin on requests to the API, nothing else changed. */
  const browserFetch: typeof fetch = async (input, init) => {
    const url = input instanceof Request ? input.url : String(input);
    if (!base || !url.startsWith(`${base}/`)) return nodeFetch(input, init);
    const headers = new Headers(init?.headers ?? (input instanceof Request ? input.headers : undefined));
    headers.set('Origin', TEST_ORIGIN);
    const jar = signedIn ? jarOf(signedIn) : null;
    if (jar?.size) headers.set('Cookie', [...jar].map(([name, value]) => `${name}=${value}`).join('; '));
    const body = init?.body instanceof FormData ? await asNodeFormData(init.body) : init?.body;
    const res = await nodeFetch(input, { ...init, headers, body });
    if (jar) keepCookies(jar, res);
    return res;
  };

  const jarOf = (person: Person) => {
    if (!jars.has(person)) jars.set(person, new Map());
    return jars.get(person)!;
  };

  beforeAll(async () => {
    server = spawn(process.execPath, ['--import', 'tsx', path.join(HERE, 'household-server.ts'), JSON.stringify(env)], {
      cwd: path.join(HERE, '..', '..'),
      env: process.env,
      stdio: ['pipe', 'pipe', 'inherit'],
    });
    const served = await firstLine(server);
    Object.assign(fx, served.fx);
    base = `http://127.0.0.1:${served.port}`;
    vi.stubEnv('EXPO_PUBLIC_API_URL', base);
    vi.stubGlobal('fetch', browserFetch);
    for (const person of Object.keys(fx.users) as Person[]) await signIn(person);
    for (const load of loaders) await load();
    // Had anything loaded the API client before the address was set, every hook would call the wrong place.
    const { apiUrl } = await import('@/lib/api-client');
    if (apiUrl('/api') !== `${base}/api`) throw new Error('lib/api-client loaded before the harness set EXPO_PUBLIC_API_URL: import features through load()');
  });

  afterEach(() => {
    cleanup();
    signedIn = null;
  });

  afterAll(async () => {
    vi.unstubAllGlobals();
    vi.unstubAllEnvs();
    if (!server || server.exitCode !== null) return;
    // Its standard input closing is the server's cue to close its database pool and queue, then exit.
    const exited = once(server, 'exit');
    server.stdin!.end();
    const late = setTimeout(() => server!.kill('SIGKILL'), 15_000);
    await exited;
    clearTimeout(late);
  });

  async function signIn(person: Person) {
    signedIn = person;
    const res = await browserFetch(`${base}/api/auth/sign-in/email`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: fx.users[person].email, password: PASSWORD }),
    });
    if (!res.ok || !jarOf(person).size) throw new Error(`sign-in of the ${person} failed: ${res.status} ${await res.text()}`);
    signedIn = null;
  }

  return {
    /** The household's people (with their e-mail addresses), its rig and its id: filled in before the first test. */
    fx,
    /** A feature's api module, loaded once the API's address is known (filled in before the first test). */
    load<M extends object>(importer: () => Promise<M>): M {
      const mod = {} as M;
      loaders.push(async () => void Object.assign(mod, await importer()));
      return mod;
    },
    /** Signs `person` in again through /api/auth/sign-in/email (after a test signed them out). */
    signIn,
    /** Renders hooks as `person` (null: nobody signed in) with a fresh QueryClient; `client` is that client, to read its cache. */
    render<R>(hook: () => R, person: Person | null = 'owner') {
      signedIn = person;
      const client = freshQueryClient();
      const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
      return { ...renderHook(hook, { wrapper }), client };
    },
  };
}

/**
 * jsdom's FormData as Node's fetch can send it, each file with its bytes, name and type: what a browser
 * sends as multipart for an upload. (jsdom's File has no arrayBuffer(), hence its FileReader; Node's
 * FormData is not a global under jsdom, hence the one Node's own Response makes.)
 */
async function asNodeFormData(form: FormData): Promise<FormData> {
  const NodeFormData = (await new Response(new URLSearchParams()).formData()).constructor as typeof FormData;
  const out = new NodeFormData();
  for (const [key, value] of form) {
    if (typeof value === 'string') out.append(key, value);
    else out.append(key, new NodeFile([Buffer.from(await bytesOf(value))], value.name, { type: value.type }) as unknown as File);
  }
  return out;
}

const bytesOf = (blob: Blob) =>
  new Promise<ArrayBuffer>((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(reader.result as ArrayBuffer);
    reader.onerror = () => reject(reader.error);
    reader.readAsArrayBuffer(blob);
  });

/** The household server's first line: its port and household, or its failure. */
async function firstLine(child: ChildProcess): Promise<{ port: number; fx: ServedHousehold }> {
  const lines = createInterface({ input: child.stdout! });
  const exit = once(child, 'exit').then(([code]) => {
    throw new Error(`tests/features/household-server.ts exited (${code}) before it listened: its error is above`);
  });
  const line = once(lines, 'line').then(([text]) => JSON.parse(text as string));
  try {
    return await Promise.race([line, exit]);
  } finally {
    exit.catch(() => undefined);
  }
}

/** What a browser keeps of the Set-Cookie headers: each cookie's value, gone when it is expired or emptied. */
function keepCookies(jar: Map<string, string>, res: Response) {
  for (const line of res.headers.getSetCookie()) {
    const [pair, ...attributes] = line.split(';');
    const eq = pair.indexOf('=');
    const name = pair.slice(0, eq).trim();
    const value = pair.slice(eq + 1).trim();
    const attr = (key: string) => attributes.map((a) => a.trim().split('=')).find(([k]) => k.toLowerCase() === key)?.[1];
    const maxAge = attr('max-age');
    const expires = attr('expires');
    const gone = value === '' || (maxAge !== undefined && Number(maxAge) <= 0) || (expires !== undefined && Date.parse(expires) <= Date.now());
    if (gone) jar.delete(name);
    else jar.set(name, value);
  }
}
