import type { Knex } from 'knex';
import type { Logger } from 'pino';
import type { InvitationCreate, PeopleQuery, PersonDto, PersonUpdate, RosterImportDto, RosterPreviewDto } from '@core/contracts';
import { ROLE_LABELS, type Role } from '@core/roles';
import type { Actor } from '../../auth/actor';
import { ConflictError, NotFoundError, ValidationError } from '../../errors';
import type { Mailer, MailMessage } from '../../mail/mailer';
import { invitationMail } from '../../mail/templates';
import { recordAudit } from '../audit/audit.repository';
import { findClass, insertEnrolments } from '../classes/classes.repository';
import * as repo from './people.repository';
import { findPerson, listPeople } from './people.read-model';
import { presentPerson } from './people.presenter';
import { parseRoster, toRowDto } from './roster';

interface Deps {
  db: Knex;
  mailer: Mailer;
  publicUrl: string;
  logger: Logger;
}

const roleList = (roles: Role[]) => roles.map((role) => ROLE_LABELS[role]).join(', ');

/** A school's people: listing, invitations, roster imports and role changes. */
export function createPeopleService({ db, mailer, publicUrl, logger }: Deps) {
  const signInUrl = (email: string) => `${publicUrl}/signin?email=${encodeURIComponent(email)}`;

  // Mail goes out only after the transaction commits, so nobody is invited to a rolled-back membership.
  function sendAll(messages: MailMessage[]): void {
    for (const message of messages) {
      mailer.send(message).catch((error: unknown) => logger.error({ err: error, to: message.to }, 'invitation mail failed'));
    }
  }

  async function present(actor: Actor, userId: string): Promise<PersonDto> {
    const row = await findPerson(db, actor.active.schoolId, userId);
    if (!row) throw new NotFoundError('That person');
    return presentPerson(row, actor);
  }

  async function checkDepartment(trx: Knex.Transaction, schoolId: string, departmentId: string | null | undefined): Promise<void> {
    if (departmentId && !(await trx('departments').where({ id: departmentId, school_id: schoolId }).first('id'))) {
      throw new ValidationError('That department is not in this school.', [
        { path: 'departmentId', message: 'Choose a department of this school.' },
      ]);
    }
  }

  /** Validates every roster row against the school's members and classes. */
  async function previewRoster(trx: Knex | Knex.Transaction, schoolId: string, csv: string) {
    const { rows, errors } = parseRoster(csv);
    const members = await repo.membersByEmail(
      trx,
      schoolId,
      rows.map((row) => row.email),
    );
    const classes = await repo.classesByName(trx, schoolId);
    for (const row of rows) {
      const member = members.get(row.email);
      if (member && (member.roles.length !== row.roles.length || row.roles.some((role) => !member.roles.includes(role)))) {
        row.errors.push(`Already a member of this school as ${roleList(member.roles)}: change their roles on the People page.`);
      }
      if (row.className && !classes.has(row.className.toLowerCase()))
        row.errors.push(`No class called “${row.className}” in this school: create it first, or fix the name.`);
    }
    const dto: RosterPreviewDto = {
      rows: rows.map((row) => toRowDto(row, members.has(row.email))),
      errors,
      valid: rows.length > 0 && errors.length === 0 && rows.every((row) => row.errors.length === 0),
    };
    return { dto, rows, members, classes };
  }

  return {
    async list(actor: Actor, query: PeopleQuery) {
      const { rows, total } = await listPeople(db, actor.active.schoolId, query);
      return { people: rows.map((row) => presentPerson(row, actor)), total, page: query.page, pageSize: query.pageSize };
    },

    async invite(actor: Actor, input: InvitationCreate, ip: string): Promise<PersonDto> {
      const schoolId = actor.active.schoolId;
      const userId = await db.transaction(async (trx) => {
        const existing = await repo.membersByEmail(trx, schoolId, [input.email]);
        if (existing.size > 0)
          throw new ConflictError('already_member', `${input.email} is already a member of ${actor.active.schoolName}.`);
        await checkDepartment(trx, schoolId, input.departmentId);
        if (input.classId) {
          if (!(await findClass(trx, schoolId, input.classId)))
            throw new ValidationError('That class is not in this school.', [
              { path: 'classId', message: 'Choose a class of this school.' },
            ]);
          if (!input.roles.includes('student'))
            throw new ValidationError('Only students are enrolled in a class.', [
              { path: 'classId', message: 'Leave the class empty unless the person is a student.' },
            ]);
        }
        const id = await repo.insertInvitedMember(trx, {
          schoolId,
          email: input.email,
          name: input.name,
          roles: input.roles,
          departmentId: input.departmentId ?? null,
          classId: input.classId ?? null,
          invitedBy: actor.userId,
        });
        if (input.classId) await insertEnrolments(trx, input.classId, [id]);
        await recordAudit(trx, {
          schoolId,
          actorId: actor.userId,
          subjectId: id,
          action: 'invitation_sent',
          data: { roles: input.roles },
          ip,
        });
        return id;
      });
      sendAll([invitationMail(input.email, input.name, actor.active.schoolName, roleList(input.roles), signInUrl(input.email))]);
      return present(actor, userId);
    },

    preview: async (actor: Actor, csv: string): Promise<RosterPreviewDto> => (await previewRoster(db, actor.active.schoolId, csv)).dto,

    /** Imports the whole roster or nothing: any row with a problem rejects the file. */
    async importRoster(actor: Actor, csv: string, ip: string): Promise<RosterImportDto> {
      const schoolId = actor.active.schoolId;
      const mails: MailMessage[] = [];
      const result = await db.transaction(async (trx) => {
        const { dto, rows, members, classes } = await previewRoster(trx, schoolId, csv);
        if (!dto.valid) {
          const details = [
            ...dto.errors.map((message) => ({ path: 'file', message })),
            ...dto.rows.flatMap((row) => row.errors.map((message) => ({ path: `line ${row.line}`, message }))),
          ];
          throw new ValidationError(
            `The roster has ${details.length} problem${details.length === 1 ? '' : 's'}; nothing was imported.`,
            details,
            'roster_invalid',
          );
        }
        let invited = 0;
        let enrolled = 0;
        for (const row of rows) {
          const classId = row.className ? classes.get(row.className.toLowerCase())! : null;
          let userId = members.get(row.email)?.userId;
          if (!userId) {
            userId = await repo.insertInvitedMember(trx, {
              schoolId,
              email: row.email,
              name: row.name,
              roles: row.roles,
              departmentId: null,
              classId,
              invitedBy: actor.userId,
            });
            await recordAudit(trx, {
              schoolId,
              actorId: actor.userId,
              subjectId: userId,
              action: 'invitation_sent',
              data: { roles: row.roles, roster: true },
              ip,
            });
            mails.push(invitationMail(row.email, row.name, actor.active.schoolName, roleList(row.roles), signInUrl(row.email)));
            invited++;
          }
          if (classId) enrolled += await insertEnrolments(trx, classId, [userId]);
        }
        return { invited, enrolled };
      });
      sendAll(mails);
      return result;
    },

    async update(actor: Actor, userId: string, changes: PersonUpdate, ip: string): Promise<PersonDto> {
      const schoolId = actor.active.schoolId;
      await db.transaction(async (trx) => {
        const admins = await repo.lockAdmins(trx, schoolId);
        const membership = await repo.findMembership(trx, schoolId, userId);
        if (!membership) throw new NotFoundError('That person');
        await checkDepartment(trx, schoolId, changes.departmentId);
        if (changes.roles && membership.roles.includes('admin') && !changes.roles.includes('admin') && admins.length <= 1) {
          throw new ConflictError(
            'last_admin',
            'This is the school’s only admin. Make someone else an admin first, then change this person’s roles.',
          );
        }
        await repo.updateMembership(trx, membership.id, changes);
        if (changes.roles)
          await recordAudit(trx, {
            schoolId,
            actorId: actor.userId,
            subjectId: userId,
            action: 'roles_changed',
            data: { from: membership.roles, to: changes.roles },
            ip,
          });
        if (changes.departmentId !== undefined)
          await recordAudit(trx, {
            schoolId,
            actorId: actor.userId,
            subjectId: userId,
            action: 'department_changed',
            data: { from: membership.departmentId, to: changes.departmentId },
            ip,
          });
      });
      return present(actor, userId);
    },
  };
}

export type PeopleService = ReturnType<typeof createPeopleService>;
