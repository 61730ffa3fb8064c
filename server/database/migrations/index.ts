import * as m0001 from './0001-accounts'
import * as m0002 from './0002-sketches'
import * as m0003 from './0003-sessions-attempts'
import * as m0004 from './0004-outbox-resets'
import * as m0005 from './0005-team'

/**
 * Every migration, in order. A static list (not a file glob) because the production server is
 * bundled and has no migration files on disk. Add new ones at the end; never edit a landed one.
 */
export const migrations = [
  { name: '0001-accounts', ...m0001 },
  { name: '0002-sketches', ...m0002 },
  { name: '0003-sessions-attempts', ...m0003 },
  { name: '0004-outbox-resets', ...m0004 },
  { name: '0005-team', ...m0005 },
]
