import { describe, expect, it } from 'vitest';
import { readLibraryFilters, writeLibraryFilters } from './library-filters';

describe('library filters in the URL', () => {
  it('reads known values and falls back to the defaults for unknown ones', () => {
    expect(readLibraryFilters(new URLSearchParams('q=pendulum&state=failed&owner=mine&sort=title'))).toEqual({
      q: 'pendulum',
      state: 'failed',
      owner: 'mine',
      sort: 'title',
    });
    expect(readLibraryFilters(new URLSearchParams('state=lost&owner=everyone&sort=random&q='))).toEqual({
      q: undefined,
      state: undefined,
      owner: 'school',
      sort: 'newest',
    });
  });

  it('writes only what differs from the defaults', () => {
    expect(writeLibraryFilters({ q: '  ', owner: 'school', sort: 'newest' }).toString()).toBe('');
    expect(writeLibraryFilters({ q: ' coil ', state: 'ready', owner: 'mine', sort: 'size' }).toString()).toBe(
      'q=coil&state=ready&owner=mine&sort=size',
    );
  });
});
