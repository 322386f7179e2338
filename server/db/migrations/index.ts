import { type Migration } from 'kysely';

import * as m001 from './001-init';

/** Every migration, in order. A new one is a new file and one more line here. */
export const migrations: Record<string, Migration> = {
  '001-init': m001,
};
