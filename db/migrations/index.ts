import type { Migration } from 'kysely';

import * as m001 from './2026-12-01-001-rigs-loads';
import * as m002 from './2026-12-01-002-cable-runs';
import * as m003 from './2026-12-01-003-notes';
import * as m004 from './2026-12-01-004-history-mail';
import * as m005 from './2026-12-01-005-readings';
import * as m015 from './2026-12-02-015-invitation-sends';
import * as m016 from './2026-12-02-016-essential-inverter-link';
import * as m019 from './2026-12-02-019-history-undo';
import * as m020 from './2026-12-02-020-trips';
import * as m021 from './2026-12-03-021-unit-prefs';
import * as m023 from './2026-12-03-023-cable-run-route-type';
import * as m024 from './2026-12-03-024-margin-comfortable-at';

// A static provider: file discovery fails under vitest, an explicit list works everywhere.
export const migrations: Record<string, Migration> = {
  '2026-12-01-001-rigs-loads': m001,
  '2026-12-01-002-cable-runs': m002,
  '2026-12-01-003-notes': m003,
  '2026-12-01-004-history-mail': m004,
  '2026-12-01-005-readings': m005,
  '2026-12-02-015-invitation-sends': m015,
  '2026-12-02-016-essential-inverter-link': m016,
  '2026-12-02-019-history-undo': m019,
  '2026-12-02-020-trips': m020,
  '2026-12-03-021-unit-prefs': m021,
  '2026-12-03-023-cable-run-route-type': m023,
  '2026-12-03-024-margin-comfortable-at': m024,
};
