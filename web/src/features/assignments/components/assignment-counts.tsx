import type { AssignmentDto } from '@core/contracts';

/** How far the class has got: students in the class, how many started, how many are done. */
export function AssignmentCounts({ counts }: { counts: AssignmentDto['counts'] }) {
  const items = [
    { label: 'Students', value: counts.students, hint: 'in the class' },
    { label: 'Started', value: counts.started, hint: 'opened, watched or answered' },
    { label: 'Done', value: counts.done, hint: 'met the completion rule' },
  ];
  return (
    <ul className="grid grid-cols-3 gap-3" aria-label="Progress of the class">
      {items.map((item) => (
        <li key={item.label} className="rounded-md bg-sunken p-3">
          <span className="block font-mono text-2xl font-bold">{item.value}</span>
          <span className="block font-bold">{item.label}</span>
          <span className="block text-sm text-ink-muted">{item.hint}</span>
        </li>
      ))}
    </ul>
  );
}
