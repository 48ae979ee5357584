import { describe, expect, it } from 'vitest';
import { EmailSchema, InvitationCreateSchema, JoinCodeSchema, PersonUpdateSchema, SchoolUpdateSchema } from './index';
import { defaultRole } from '../roles';

describe('shared contracts', () => {
  it('normalises e-mail addresses so they compare equal however typed', () => {
    expect(EmailSchema.parse('  Ada.Q@Example.ORG ')).toBe('ada.q@example.org');
    expect(EmailSchema.safeParse('ada@').error?.issues[0]?.message).toBe('Enter a valid e-mail address, like name@school.example.');
  });

  it('accepts join codes in any case and names the format otherwise', () => {
    expect(JoinCodeSchema.parse('tenfphys')).toBe('TENFPHYS');
    expect(JoinCodeSchema.safeParse('TEN-FPHY').error?.issues[0]?.message).toBe('A class code has 8 letters and digits, like K7QM2XPA.');
  });

  it('de-duplicates roles and requires at least one', () => {
    expect(InvitationCreateSchema.parse({ email: 'a@b.example', name: 'A', roles: ['teacher', 'teacher'] }).roles).toEqual(['teacher']);
    expect(InvitationCreateSchema.safeParse({ email: 'a@b.example', name: 'A', roles: [] }).success).toBe(false);
  });

  it('PATCH semantics: undefined leaves alone, null clears, empty is refused', () => {
    expect(PersonUpdateSchema.parse({ departmentId: null })).toEqual({ departmentId: null });
    expect(PersonUpdateSchema.safeParse({}).error?.issues[0]?.message).toBe('Send roles or departmentId to change.');
  });

  it('accepts bare domains only', () => {
    expect(SchoolUpdateSchema.parse({ emailDomains: ['Fernhollow.Example'] }).emailDomains).toEqual(['fernhollow.example']);
    expect(SchoolUpdateSchema.safeParse({ emailDomains: ['@fernhollow.example'] }).success).toBe(false);
    expect(SchoolUpdateSchema.safeParse({ emailDomains: ['https://x.example'] }).success).toBe(false);
  });

  it('lands a teacher who also coordinates on the teacher home first', () => {
    expect(defaultRole(['coordinator', 'teacher'])).toBe('teacher');
    expect(defaultRole(['admin'])).toBe('admin');
    expect(defaultRole([])).toBeUndefined();
  });
});
