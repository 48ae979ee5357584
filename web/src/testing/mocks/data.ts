import type { ClassDetailDto, ClassDto, MeDto, PersonDto, StudentClassDto } from '@core/contracts';
import type { Role } from '@core/roles';

// Invented test data: an obviously fictional school, never a real one.
export const SCHOOL_ID = '11111111-1111-4111-8111-111111111111';
export const OTHER_SCHOOL_ID = '22222222-2222-4222-8222-222222222222';
let counter = 0;
/** A fresh UUID-shaped id (valid for the contracts' z.uuid()). */
export function nextId(): string {
  counter += 1;
  return `00000000-0000-4000-8000-${String(counter).padStart(12, '0')}`;
}

export function buildMe(roles: Role[] = ['teacher'], overrides: Partial<MeDto> = {}): MeDto {
  const active = roles[0] ?? 'teacher';
  return {
    user: { id: nextId(), email: 'ada.quill@brackenmoor.example', name: 'Ada Quill' },
    memberships: [{ schoolId: SCHOOL_ID, schoolName: 'Brackenmoor School (test)', timeZone: 'Europe/London', locale: 'en-GB', roles }],
    active: { schoolId: SCHOOL_ID, role: active },
    csrfToken: 'csrf-from-me',
    ...overrides,
  };
}

export function buildClass(overrides: Partial<ClassDto> = {}): ClassDto {
  return {
    id: nextId(),
    name: 'Year 10 Physics (test)',
    joinCode: 'K7QM2XPA',
    departmentId: null,
    departmentName: 'Physics',
    teacher: { id: nextId(), name: 'Ada Quill', email: 'ada.quill@brackenmoor.example' },
    studentCount: 3,
    createdAt: '2025-01-06T09:00:00.000Z',
    ...overrides,
  };
}

export function buildClassDetail(overrides: Partial<ClassDetailDto> = {}): ClassDetailDto {
  return { ...buildClass(), students: [], ...overrides };
}

export function buildStudentClass(overrides: Partial<StudentClassDto> = {}): StudentClassDto {
  return {
    id: nextId(),
    name: 'Year 10 Physics (test)',
    departmentName: 'Physics',
    teacherName: 'Ada Quill',
    enrolledAt: '2025-01-06T09:00:00.000Z',
    ...overrides,
  };
}

export function buildPerson(overrides: Partial<PersonDto> = {}): PersonDto {
  return {
    userId: nextId(),
    email: 'tobin.marsh@brackenmoor.example',
    name: 'Tobin Marsh',
    roles: ['student'],
    status: 'active',
    departmentId: null,
    departmentName: null,
    classNames: [],
    lastSignInAt: null,
    abilities: { changeRoles: true },
    ...overrides,
  };
}
