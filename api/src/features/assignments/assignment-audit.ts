import type { AssignmentSettings } from './assignments.repository';

/** What names an assignment in the audit log (subject_id names users only), so a deleted one still reads. */
export function auditData(
  assignment: { id: string; lessonId: string; lessonTitle: string; classId: string; className: string },
  extra: Record<string, unknown> = {},
): Record<string, unknown> {
  return {
    assignmentId: assignment.id,
    lessonId: assignment.lessonId,
    title: assignment.lessonTitle,
    classId: assignment.classId,
    className: assignment.className,
    ...extra,
  };
}

const comparable = (value: Date | string | number | null) => (value instanceof Date ? value.toISOString() : value);

/** The settings an update changed, each as { from, to } (instants as ISO text). */
export function settingChanges(before: AssignmentSettings, after: AssignmentSettings): Record<string, { from: unknown; to: unknown }> {
  const changes: Record<string, { from: unknown; to: unknown }> = {};
  for (const field of Object.keys(after) as (keyof AssignmentSettings)[]) {
    const from = comparable(before[field]);
    const to = comparable(after[field]);
    if (from !== to) changes[field] = { from, to };
  }
  return changes;
}
