import { describe, expect, it } from 'vitest';
import { isFiltered, readLessonFilters, writeLessonFilters } from './lesson-filters';

describe('lesson filters in the URL', () => {
  it('reads what the contract knows and drops the rest', () => {
    const filters = readLessonFilters(new URLSearchParams('q=%20coil%20&tag=Coils&owner=nobody&state=lost&sort=title'));
    expect(filters).toEqual({ q: 'coil', tag: 'coils', owner: undefined, state: undefined, sort: 'title' });
  });

  it('accepts me, others or a person id as the owner', () => {
    expect(readLessonFilters(new URLSearchParams('owner=others')).owner).toBe('others');
    const id = '00000000-0000-4000-8000-000000000042';
    expect(readLessonFilters(new URLSearchParams(`owner=${id}`)).owner).toBe(id);
  });

  it('writes back without the defaults, and round-trips', () => {
    const params = writeLessonFilters({ q: 'helmholtz', tag: 'coils', owner: 'me', state: 'draft', sort: 'updated' });
    expect(params.toString()).toBe('q=helmholtz&tag=coils&owner=me&state=draft');
    expect(readLessonFilters(params)).toEqual({ q: 'helmholtz', tag: 'coils', owner: 'me', state: 'draft', sort: 'updated' });
    expect(writeLessonFilters(readLessonFilters(new URLSearchParams())).toString()).toBe('');
  });

  it('knows when the list is narrowed (the sort alone does not narrow it)', () => {
    expect(isFiltered(readLessonFilters(new URLSearchParams('sort=title')))).toBe(false);
    expect(isFiltered(readLessonFilters(new URLSearchParams('state=archived')))).toBe(true);
  });
});
