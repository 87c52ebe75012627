import { date, ref, string, table, timestamp } from './columns';

/** A session that was signed out: its cookie is refused until it would have expired anyway. */
export class EndedSession extends table(
  'ended_sessions',
  { sid: string(64).primaryKey(), userId: ref(), expiresAt: date(), createdAt: timestamp() },
  { updatedAt: false },
) {}
