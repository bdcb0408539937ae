// The real app for the hook tests, in a Node process of its own (run by tests/features/harness.tsx as
// `node --import tsx tests/features/household-server.ts`): the hooks run under jsdom, whose globals
// (typed arrays among them) the server's libraries must not see. It makes the app on the test database
// (makeTestApp) and a household of its own (householdFixture), listens on an ephemeral port on 127.0.0.1,
// prints one JSON line ({ port, fx }) and shuts down when its standard input closes.
import { once } from 'node:events';
import type { AddressInfo } from 'node:net';

import { householdFixture } from '../server/helpers';
import { closeTestApp, makeTestApp } from '../server/test-app';

export type ServedHousehold = Pick<Awaited<ReturnType<typeof householdFixture>>, 'users' | 'rigId' | 'householdId'>;

async function main() {
  const env = JSON.parse(process.argv[2] ?? '{}') as Record<string, string>;
  const ctx = await makeTestApp(env);
  const { users, rigId, householdId } = await householdFixture(ctx);
  const server = ctx.app.listen(0, '127.0.0.1');
  await once(server, 'listening');
  const fx: ServedHousehold = { users, rigId, householdId };
  process.stdout.write(`${JSON.stringify({ port: (server.address() as AddressInfo).port, fx })}\n`);

  process.stdin.resume();
  await once(process.stdin, 'end');
  server.closeAllConnections();
  await new Promise((resolve) => server.close(resolve));
  await closeTestApp(ctx);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
