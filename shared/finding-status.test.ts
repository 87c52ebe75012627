import { describe, expect, it } from 'vitest';
import { worstFirst } from './finding-status';

describe('worstFirst', () => {
  it('puts fails, then attentions, then passes first, keeping the order within each', () => {
    const f = (id: string, status: 'pass' | 'attention' | 'fail') => ({ id, status });
    const list = [f('a', 'pass'), f('b', 'fail'), f('c', 'attention'), f('d', 'pass'), f('e', 'fail')];
    expect(worstFirst(list).map((x) => x.id)).toEqual(['b', 'e', 'c', 'a', 'd']);
    expect(list.map((x) => x.id)).toEqual(['a', 'b', 'c', 'd', 'e']);
  });
});
