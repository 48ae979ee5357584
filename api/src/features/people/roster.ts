import Papa from 'papaparse';
import { EmailSchema, PersonNameSchema, ROSTER_COLUMNS, type RosterRowDto } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { RoleSchema, type Role } from '@core/roles';

export interface RosterLine {
  line: number;
  email: string;
  name: string;
  roles: Role[];
  className: string | null;
  errors: string[];
}

/** Parses a roster CSV (header `email,name,roles,class`) into rows, each with its own problems listed. */
export function parseRoster(csv: string): { rows: RosterLine[]; errors: string[] } {
  const parsed = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ''), {
    header: true,
    // Blank rows are dropped below, after numbering, so each row keeps its line number in the file.
    skipEmptyLines: false,
    transformHeader: (header) => header.trim().toLowerCase(),
  });
  const headers = parsed.meta.fields ?? [];
  const missing = ROSTER_COLUMNS.filter((column) => column !== 'class' && !headers.includes(column));
  if (missing.length > 0) {
    return { rows: [], errors: [`The header row must name the columns ${ROSTER_COLUMNS.join(', ')}; missing: ${missing.join(', ')}.`] };
  }
  const records = parsed.data
    .map((record, index) => ({ record, line: index + 2 })) // line 1 is the header
    .filter(({ record }) => Object.values(record).some((value) => typeof value === 'string' && value.trim() !== ''));
  if (records.length === 0) return { rows: [], errors: ['The file has a header row but no people.'] };
  if (records.length > LIMITS.rosterRowsMax) {
    return { rows: [], errors: [`A roster has at most ${LIMITS.rosterRowsMax} people; this one has ${records.length}. Split it.`] };
  }
  const seen = new Map<string, number>();
  const rows = records.map(({ record, line }) => {
    const errors: string[] = [];
    const email = EmailSchema.safeParse(record.email ?? '');
    const name = PersonNameSchema.safeParse(record.name ?? '');
    if (!email.success) errors.push(email.error.issues[0]!.message);
    if (!name.success) errors.push(name.error.issues[0]!.message);
    const roleWords = (record.roles ?? '')
      .split(/[;|]/)
      .map((word) => word.trim().toLowerCase())
      .filter(Boolean);
    const roles = roleWords.flatMap((word) => (RoleSchema.safeParse(word).success ? [word as Role] : []));
    const unknown = roleWords.filter((word) => !RoleSchema.safeParse(word).success);
    if (roleWords.length === 0) errors.push('Give at least one role (admin, coordinator, teacher, substitute or student).');
    if (unknown.length > 0)
      errors.push(
        `Unknown role ${unknown.map((u) => `“${u}”`).join(', ')}: use admin, coordinator, teacher, substitute or student, separated by ;`,
      );
    const className = record.class?.trim() || null;
    if (className && !roles.includes('student'))
      errors.push('Only students are enrolled in a class from a roster; leave the class empty for staff.');
    const emailValue = email.success ? email.data : (record.email ?? '').trim();
    const earlier = email.success ? seen.get(emailValue) : undefined;
    if (earlier) errors.push(`This address is already on line ${earlier}.`);
    if (email.success && !earlier) seen.set(emailValue, line);
    return {
      line,
      email: emailValue,
      name: name.success ? name.data : (record.name ?? '').trim(),
      roles: [...new Set(roles)],
      className,
      errors,
    };
  });
  // A blank line parses as a one-field row; that is not a problem worth reporting.
  const blankLines = new Set(
    parsed.data.flatMap((record, index) => (Object.values(record).every((v) => !v || !String(v).trim()) ? [index] : [])),
  );
  const parseErrors = parsed.errors
    .filter((error) => error.row === undefined || !blankLines.has(error.row))
    .map((error) => `Line ${(error.row ?? 0) + 2}: ${error.message}.`);
  return { rows, errors: parseErrors };
}

export function toRowDto(row: RosterLine, existing: boolean): RosterRowDto {
  return { line: row.line, email: row.email, name: row.name, roles: row.roles, className: row.className, errors: row.errors, existing };
}
