import type { Role } from '@core/roles';

/**
 * The invented demo scenario: a fictional school's physics department. Every name and address
 * here is made up; `.example` domains are reserved and never deliver mail anywhere.
 */
export const DEMO_SCHOOL = {
  name: 'Fernhollow Academy (demo)',
  timeZone: 'Europe/London',
  locale: 'en-GB',
  emailDomains: ['fernhollow.example'],
  department: 'Physics',
} as const;

/** A second fictional school, so a substitute covers in two schools. */
export const SECOND_SCHOOL = {
  name: 'Marrowby Sixth Form (demo)',
  timeZone: 'Europe/London',
  locale: 'en-GB',
  emailDomains: ['marrowby.example'],
  department: 'Science',
} as const;

export interface DemoPerson {
  email: string;
  name: string;
  roles: Role[];
  label: string;
}

export const DEMO_STAFF: DemoPerson[] = [
  { email: 'ada.quillfeather@fernhollow.example', name: 'Ada Quillfeather', roles: ['teacher'], label: 'Teacher' },
  { email: 'bram.ostrowe@fernhollow.example', name: 'Bram Ostrowe', roles: ['teacher'], label: 'Teacher' },
  {
    email: 'cora.vantwell@fernhollow.example',
    name: 'Cora Vantwell',
    roles: ['coordinator', 'teacher'],
    label: 'Coordinator (also teaches)',
  },
  { email: 'dov.pellring@fernhollow.example', name: 'Dov Pellring', roles: ['substitute'], label: 'Substitute teacher (two schools)' },
  { email: 'esme.hartbridge@fernhollow.example', name: 'Esme Hartbridge', roles: ['admin'], label: 'School admin' },
];

/** Three classes of invented students, named whimsically so they read as demo data. */
export const DEMO_CLASSES = [
  {
    name: '10F Physics',
    joinCode: 'TENFPHYS',
    teacher: 'ada.quillfeather@fernhollow.example',
    students: [
      'Juno Fairweather',
      'Kit Lanternby',
      'Mira Coppervale',
      'Olly Brackenridge',
      'Pia Thistlewood',
      'Rufus Emberly',
      'Sable Winterbourne',
      'Tomas Gallowglass',
    ],
  },
  {
    name: '11K Physics',
    joinCode: 'ELVKPHYS',
    teacher: 'bram.ostrowe@fernhollow.example',
    students: [
      'Uma Kettleworth',
      'Vance Harrowgate',
      'Wren Ashcombe',
      'Xavi Dunmere',
      'Yara Pebblestone',
      'Zed Marchbank',
      'Ivo Rookwood',
      'Lotte Quarrender',
    ],
  },
  {
    name: '12C Physics',
    joinCode: 'TWLVCFRN',
    teacher: 'cora.vantwell@fernhollow.example',
    students: ['Nia Hollowmere', 'Osric Fenwright', 'Perpetua Vale', 'Quill Ashdown', 'Romilly Starke', 'Silas Brambleford'],
  },
] as const;

export function studentEmail(name: string): string {
  return `${name.toLowerCase().replace(/[^a-z]+/g, '.')}@fernhollow.example`;
}

const studentAccount = (name: string, className: string): DemoPerson => ({
  email: studentEmail(name),
  name,
  roles: ['student'] as Role[],
  label: `Student, ${className}`,
});

/** Ada's class, which seed step 004 gives the demo assignment: every student of it is offered, so the class can complete it. */
export const DEMO_ASSIGNED_CLASS = DEMO_CLASSES[0];

/** The accounts the sign-in stand-in offers and `npm start` prints. */
export const demoAccounts: DemoPerson[] = [
  ...DEMO_STAFF,
  ...DEMO_ASSIGNED_CLASS.students.map((name) => studentAccount(name, DEMO_ASSIGNED_CLASS.name)),
  ...DEMO_CLASSES.slice(1, 2).map((cls) => studentAccount(cls.students[0], cls.name)),
];
