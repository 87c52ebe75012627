import { date, id, string, table, timestamps, unsigned } from './columns';

/**
 * A person who signs in. `sessionVersion` is bumped to end every existing session of the user.
 * `emailConfirmedAt` is null until the person proves they hold the address (the e-mailed link, or an
 * accepted invitation); until then the account cannot sign in.
 */
export class User extends table(
  'users',
  {
    id: id(),
    email: string(254).unique(),
    name: string(120),
    passwordHash: string(100),
    sessionVersion: unsigned().defaultsTo(1),
    emailConfirmedAt: date().nullable(),
    ...timestamps(),
  },
  { defaultScope: { attributes: { exclude: ['passwordHash'] } }, scopes: { withPassword: {} } },
) {}
