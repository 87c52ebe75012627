import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { patchOf } from './patch';

const fields = {
  name: z.string().min(1, 'Give it a name.'),
  notes: z.string().max(5, 'Notes can be at most 5 characters.').nullable().default(null),
  count: z.number().default(1),
};

describe('patchOf', () => {
  const patch = patchOf(fields);

  it('takes any subset and fills in no defaults for what it leaves out', () => {
    expect(patch.parse({ name: 'Tank' })).toEqual({ name: 'Tank' });
    expect(patch.parse({ notes: null })).toEqual({ notes: null });
  });

  it('keeps each field’s own rule and message', () => {
    const r = patch.safeParse({ notes: 'far too long' });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]).toMatchObject({
      path: ['notes'],
      message: 'Notes can be at most 5 characters.',
    });
  });

  it('refuses an empty body and fields it does not know', () => {
    expect(patch.safeParse({}).error?.issues[0]?.message).toBe('Send at least one field to change.');
    expect(patch.safeParse({ name: 'Tank', colour: 'red' }).success).toBe(false);
  });
});
