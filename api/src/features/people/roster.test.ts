import { describe, expect, it } from 'vitest';
import { parseRoster } from './roster';

describe('parseRoster', () => {
  it('keeps file line numbers across blank and comma-only rows', () => {
    const { rows, errors } = parseRoster('email,name,roles,class\n\nana@x.example,Ana,student,\n,,,\nbad,Bo,student,\n');
    expect(errors).toEqual([]);
    expect(rows.map((row) => [row.line, row.email, row.errors.length])).toEqual([
      [3, 'ana@x.example', 0],
      [5, 'bad', 1],
    ]);
  });

  it('reads quoted fields, a byte-order mark and either role separator', () => {
    const { rows } = parseRoster('\uFEFFemail,name,roles,class\r\n"lee@x.example","Lee, Jr.",teacher|coordinator,\r\n');
    expect(rows[0]).toMatchObject({ line: 2, name: 'Lee, Jr.', roles: ['teacher', 'coordinator'], errors: [] });
  });

  it('reports a row with too few columns', () => {
    const { rows, errors } = parseRoster('email,name,roles,class\nsolo@x.example\n');
    expect(rows[0]!.errors).toContain('Enter a name.');
    expect(errors[0]).toMatch(/^Line 2: /);
  });
});
