import { date, id, string, table, timestamps, unsigned } from './columns';

/** A counter of failed sign-ins for one account or one client address within a time window. */
export class SignInAttempt extends table('sign_in_attempts', {
  id: id(),
  key: string(100).unique(),
  windowStart: date(),
  count: unsigned().defaultsTo(0),
  ...timestamps(),
}) {}
