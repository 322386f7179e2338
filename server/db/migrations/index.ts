import { type Migration } from 'kysely';

import * as m001 from './001-init';
import * as m002 from './002-sign-in-limits';
import * as m003 from './003-consignment-flow';
import * as m004 from './004-outbox-delivery';
import * as m005 from './005-sales';
import * as m006 from './006-statements';
import * as m007 from './007-calendar-feeds';
import * as m008 from './008-bank-columns';

/** Every migration, in order. A new one is a new file and one more line here. */
export const migrations: Record<string, Migration> = {
  '001-init': m001,
  '002-sign-in-limits': m002,
  '003-consignment-flow': m003,
  '004-outbox-delivery': m004,
  '005-sales': m005,
  '006-statements': m006,
  '007-calendar-feeds': m007,
  '008-bank-columns': m008,
};
