// Prints the local AUTH_SECRET for start.sh: made at random on first run in .data/auth-secret (mode 0600).
import { resolve } from 'node:path';

import { localAuthSecret } from '../server/security/secrets';

process.stdout.write(localAuthSecret(resolve(process.argv[2] ?? '.data/auth-secret')));
