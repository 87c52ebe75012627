import { describe, expect, it } from 'vitest';
import { lampListView } from './list-view';

const read = (qs: string) => lampListView.viewFromSearchParams(new URLSearchParams(qs));
const write = (qs: string) => lampListView.searchParamsForView(read(qs)).toString();

describe('the lamp log’s cursor in the address', () => {
  it('is read beside the page number beyond the first page, and written back', () => {
    expect(read('page=3&after=abc_-9').seek).toEqual({ after: 'abc_-9' });
    expect(read('page=2&before=xyz').seek).toEqual({ before: 'xyz' });
    expect(write('page=3&after=abc_-9')).toBe('page=3&after=abc_-9');
    expect(lampListView.apiQueryForView(read('page=3&after=abc'), { organisationId: 7 }).get('after')).toBe(
      'abc',
    );
    expect(lampListView.listQueryForView(read('page=3&before=abc'))).toMatchObject({
      offset: 50,
      before: 'abc',
    });
  });

  it('is dropped on the first page and when it is not a cursor', () => {
    expect(read('after=abc').seek).toBeUndefined();
    expect(write('page=1&after=abc')).toBe('');
    expect(read('page=2&after=%3Cscript%3E').seek).toBeUndefined();
    expect(lampListView.listQueryForView(read('page=2'))).not.toHaveProperty('after');
  });
});
