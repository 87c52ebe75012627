import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { down, up } from '@/migrations/0018-account-confirmation';
import { AccountLink, User } from '@/models';
import { createUser, testDb, withTestDatabase } from './helpers/db';

withTestDatabase();

describe('migration 0018: account confirmation', () => {
  it('counts every existing account as confirmed and keeps waiting password-reset links working', async () => {
    const { user } = await createUser();
    const sequelize = testDb();
    const context = sequelize.getQueryInterface();
    await down({ context });
    // As the schema was before: an account and an unused "forgot your password?" link.
    const created = new Date('2026-01-15T09:30:00Z');
    await sequelize.query('UPDATE users SET created_at = ? WHERE id = ?', {
      replacements: [created, user.id],
    });
    const expires = new Date(Date.now() + 20 * 60_000);
    await sequelize.query(
      'INSERT INTO password_resets (user_id, token_hash, expires_at, created_at) VALUES (?, ?, ?, NOW())',
      { replacements: [user.id, 'f'.repeat(64), expires], type: QueryTypes.INSERT },
    );

    await up({ context });
    const after = await User.findByPk(user.id);
    expect(after?.emailConfirmedAt?.toISOString()).toBe(created.toISOString());
    const links = await AccountLink.findAll({ where: { userId: user.id } });
    expect(links.map((l) => [l.purpose, l.tokenHash, l.usedAt])).toEqual([
      ['password-reset', 'f'.repeat(64), null],
    ]);

    // Going back keeps the reset link and drops only what needs confirmation.
    await AccountLink.create({
      userId: user.id,
      purpose: 'confirm-account',
      tokenHash: 'e'.repeat(64),
      expiresAt: expires,
    });
    await down({ context });
    const kept = await sequelize.query<{ token_hash: string }>('SELECT token_hash FROM password_resets', {
      type: QueryTypes.SELECT,
    });
    expect(kept.map((r) => r.token_hash)).toEqual(['f'.repeat(64)]);
    await up({ context });
  });
});
