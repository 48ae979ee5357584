import type { Knex } from 'knex';
import type { AssignmentMovedDto } from '@core/contracts';
import { changedAnswerableKeys, moveProblems } from '@core/assignments';
import type { Actor } from '../../auth/actor';
import { AppError, ConflictError, NotFoundError, ValidationError } from '../../errors';
import { recordAudit } from '../audit/audit.repository';
import * as repo from './assignments.repository';
import * as read from './assignments.read-model';
import { listRegradeCandidates } from './regrade.read-model';
import { regradeResponses } from './regrade';
import { auditData } from './assignment-audit';

type MoveResult = Omit<AssignmentMovedDto, 'assignment'>;

function refusal(code: string, lead: string, problems: string[]): AppError {
  const more = problems.length > 1 ? ` (and ${problems.length - 1} more)` : '';
  return new AppError(
    409,
    code,
    `${lead} ${problems[0]}${more}`,
    problems.map((message) => ({ path: 'versionNumber', message })),
  );
}

/**
 * Points an assignment (the caller may manage it) at a newer version of its lesson with the same
 * answerable checkpoints, and regrades the recorded answers at the checkpoints that changed, in
 * one transaction: either every changed grade and the move are saved, or nothing is.
 */
export async function moveAssignment(db: Knex, actor: Actor, view: read.AssignmentView, toNumber: number): Promise<MoveResult> {
  const schoolId = view.schoolId;
  return db.transaction(async (trx) => {
    // No answer is recorded while the move regrades (and moves, edits and deletes run one at a time).
    const locked = await repo.lockAgainstAnswers(trx, schoolId, view.id);
    if (!locked) throw new NotFoundError('That assignment');
    const fromNumber = locked.versionNumber;
    if (toNumber === fromNumber) throw new ConflictError('already_on_version', `This assignment is already on version ${fromNumber}.`);
    if (toNumber < fromNumber) {
      throw new ConflictError(
        'older_version',
        `Version ${toNumber} is older than the assigned version ${fromNumber}: an assignment moves only to a newer, corrected version of its lesson.`,
      );
    }
    const target = await read.findLessonVersion(trx, schoolId, locked.lessonId, toNumber);
    if (!target) {
      const facts = await read.findLessonFacts(trx, schoolId, locked.lessonId);
      const message = `“${view.lessonTitle}” has no version ${toNumber}; its newest is version ${facts?.latestVersion ?? fromNumber}.`;
      throw new ValidationError(message, [{ path: 'versionNumber', message }], 'version_not_found');
    }
    const from = await read.findVersionContent(trx, schoolId, locked.lessonVersionId);
    if (!from) throw new NotFoundError(`Version ${fromNumber} of this lesson`);
    const problems = moveProblems(from, target.content);
    if (problems.length > 0) {
      throw refusal('versions_incompatible', `Version ${toNumber} cannot replace version ${fromNumber} for this assignment:`, problems);
    }
    const changedKeys = changedAnswerableKeys(from, target.content);
    const outcome = regradeResponses({
      assignmentId: view.id,
      locale: actor.active.locale,
      to: target.content,
      toVersion: toNumber,
      candidates: await listRegradeCandidates(trx, schoolId, view.id, changedKeys),
    });
    if (outcome.problems.length > 0) {
      throw refusal(
        'answers_not_gradable',
        `Version ${toNumber} cannot grade the answers already recorded, so nothing was moved:`,
        outcome.problems,
      );
    }
    await repo.insertRegrades(trx, {
      schoolId,
      assignmentId: view.id,
      toVersion: toNumber,
      gradedBy: actor.userId,
      changes: outcome.changes,
    });
    const result: MoveResult = {
      fromVersion: fromNumber,
      toVersion: toNumber,
      changedKeys,
      responsesRegraded: outcome.regraded,
      gradesChanged: outcome.changes.length,
      studentsAffected: new Set(outcome.changes.map((change) => change.studentId)).size,
    };
    await repo.recordMove(trx, {
      schoolId,
      assignmentId: view.id,
      toVersionId: target.versionId,
      fromVersion: fromNumber,
      toVersion: toNumber,
      changedKeys,
      responsesRegraded: result.responsesRegraded,
      gradesChanged: result.gradesChanged,
      movedBy: actor.userId,
    });
    await recordAudit(trx, {
      schoolId,
      actorId: actor.userId,
      subjectId: null,
      action: 'assignment_moved',
      data: auditData(view, { ...result }),
    });
    return result;
  });
}
