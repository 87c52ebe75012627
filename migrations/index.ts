import type { QueryInterface } from 'sequelize';
import * as m0001 from './0001-foundation';
import * as m0002 from './0002-sign-in-attempts';
import * as m0003 from './0003-designs-variants-shares';
import * as m0004 from './0004-species-lamp-types';
import * as m0005 from './0005-lamp-log';
import * as m0006 from './0006-zone-derived-uvb-targets';
import * as m0007 from './0007-ended-sessions';
import * as m0008 from './0008-background-jobs';
import * as m0009 from './0009-lamp-outlooks';
import * as m0010 from './0010-species-length-climbs-morph';
import * as m0011 from './0011-password-resets';
import * as m0012 from './0012-exact-numbers';
import * as m0013 from './0013-list-sort-indexes';
import * as m0014 from './0014-reading-setup';
import * as m0015 from './0015-lamp-lifetime-table';
import * as m0016 from './0016-lamp-reach-wording';
import * as m0017 from './0017-starting-sheets-size-climbing';
import * as m0018 from './0018-account-confirmation';
import * as m0019 from './0019-customers-counter';
import * as m0020 from './0020-lamp-curve-adoptions';
import * as m0021 from './0021-lamp-outlook-status-counts';
import * as m0022 from './0022-lamp-outlook-counts-row';
import * as m0023 from './0023-customer-keeper-link';
import * as m0024 from './0024-organisation-contact';
import * as m0025 from './0025-lamp-outlook-due-last';
import * as m0026 from './0026-lamp-outlook-sort-indexes';

export type Migration = {
  name: string;
  up: (p: { context: QueryInterface }) => Promise<void>;
  down: (p: { context: QueryInterface }) => Promise<void>;
};

/**
 * Every migration, in order. An explicit list (not a glob) so umzug finds them the same way
 * under tsx, vitest and the Next bundler. Add new ones at the end; never edit one that has shipped.
 */
export const migrations: Migration[] = [
  { name: '0001-foundation', ...m0001 },
  { name: '0002-sign-in-attempts', ...m0002 },
  { name: '0003-designs-variants-shares', ...m0003 },
  { name: '0004-species-lamp-types', ...m0004 },
  { name: '0005-lamp-log', ...m0005 },
  { name: '0006-zone-derived-uvb-targets', ...m0006 },
  { name: '0007-ended-sessions', ...m0007 },
  { name: '0008-background-jobs', ...m0008 },
  { name: '0009-lamp-outlooks', ...m0009 },
  { name: '0010-species-length-climbs-morph', ...m0010 },
  { name: '0011-password-resets', ...m0011 },
  { name: '0012-exact-numbers', ...m0012 },
  { name: '0013-list-sort-indexes', ...m0013 },
  { name: '0014-reading-setup', ...m0014 },
  { name: '0015-lamp-lifetime-table', ...m0015 },
  { name: '0016-lamp-reach-wording', ...m0016 },
  { name: '0017-starting-sheets-size-climbing', ...m0017 },
  { name: '0018-account-confirmation', ...m0018 },
  { name: '0019-customers-counter', ...m0019 },
  { name: '0020-lamp-curve-adoptions', ...m0020 },
  { name: '0021-lamp-outlook-status-counts', ...m0021 },
  { name: '0022-lamp-outlook-counts-row', ...m0022 },
  { name: '0023-customer-keeper-link', ...m0023 },
  { name: '0024-organisation-contact', ...m0024 },
  { name: '0025-lamp-outlook-due-last', ...m0025 },
  { name: '0026-lamp-outlook-sort-indexes', ...m0026 },
];
