import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { hashShareToken, isWellFormedShareToken, newShareToken, shareLinkState, shareUrl } from './tokens';

describe('share tokens', () => {
  it('carries 256 random bits as 43 base64url characters', () => {
    const { token } = newShareToken();
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(Buffer.from(token, 'base64url')).toHaveLength(32);
  });

  it('never repeats across many draws', () => {
    const seen = new Set(Array.from({ length: 2000 }, () => newShareToken().token));
    expect(seen.size).toBe(2000);
  });

  it('stores the SHA-256 of the token, not the token', () => {
    const { token, tokenHash } = newShareToken();
    expect(tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
    expect(tokenHash).toHaveLength(64);
    expect(tokenHash).not.toContain(token);
    expect(hashShareToken(token)).toBe(tokenHash);
  });

  it('rejects malformed tokens before any lookup', () => {
    expect(isWellFormedShareToken(newShareToken().token)).toBe(true);
    expect(isWellFormedShareToken('short')).toBe(false);
    expect(isWellFormedShareToken('a'.repeat(42) + '/')).toBe(false);
    expect(isWellFormedShareToken('a'.repeat(44))).toBe(false);
  });
});

describe('shareLinkState', () => {
  const now = new Date('2026-06-01T12:00:00Z');
  it('is active without expiry or revocation', () => {
    expect(shareLinkState({ revokedAt: null, expiresAt: null }, now)).toBe('active');
    expect(shareLinkState({ revokedAt: null, expiresAt: new Date('2026-06-02T00:00:00Z') }, now)).toBe(
      'active',
    );
  });
  it('expires at the expiry instant', () => {
    expect(shareLinkState({ revokedAt: null, expiresAt: now }, now)).toBe('expired');
    expect(shareLinkState({ revokedAt: null, expiresAt: new Date('2026-05-01T00:00:00Z') }, now)).toBe(
      'expired',
    );
  });
  it('reports revocation first', () => {
    expect(shareLinkState({ revokedAt: now, expiresAt: new Date('2026-01-01T00:00:00Z') }, now)).toBe(
      'revoked',
    );
  });
});

describe('shareUrl', () => {
  it('joins the app address and the token', () => {
    expect(shareUrl('http://localhost:3000/', 'abc')).toBe('http://localhost:3000/s/abc');
    expect(shareUrl('https://baskwell.example', 'abc')).toBe('https://baskwell.example/s/abc');
  });
});
