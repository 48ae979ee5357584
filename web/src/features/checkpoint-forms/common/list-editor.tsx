import type { ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { FieldError } from '@/components/ui/field';
import { PlusIcon } from '@/components/ui/icons';
import { cn } from '@/lib/cn';
import { useProblemsAt } from './problem-placement';

type ListEditorProps<T> = {
  /** The list's path in the checkpoint ('options'): its problems show above the items. */
  path: string;
  legend: ReactNode;
  hint?: ReactNode;
  items: readonly T[];
  onChange: (next: T[]) => void;
  /** "Option 2": names each item's box and buttons for screen readers. */
  itemName: (index: number) => string;
  newItem: () => T;
  addLabel: string;
  max: number;
  /** Items that must stay (a list that may not be emptied). */
  min?: number;
  itemKey: (item: T, index: number) => string;
  renderItem: (item: T, index: number) => ReactNode;
  /** The contract's message for the list as a whole. */
  error?: string;
  reorder?: boolean;
};

function move<T>(items: readonly T[], from: number, to: number): T[] {
  const next = [...items];
  const [item] = next.splice(from, 1);
  if (item !== undefined) next.splice(to, 0, item);
  return next;
}

/** A list the teacher adds to, removes from and reorders with up/down buttons (keyboard friendly). */
export function ListEditor<T>({
  path,
  legend,
  hint,
  items,
  onChange,
  itemName,
  newItem,
  addLabel,
  max,
  min = 0,
  itemKey,
  renderItem,
  error,
  reorder = true,
}: ListEditorProps<T>) {
  const problems = useProblemsAt(path);
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-1 font-bold">{legend}</legend>
      {hint ? <p className="-mt-2 text-sm text-ink-muted">{hint}</p> : null}
      <FieldError message={[error, problems].filter(Boolean).join(' ') || undefined} />
      {items.length > 0 ? (
        <ol className="flex flex-col gap-3">
          {items.map((item, index) => (
            <ListItem key={itemKey(item, index)} path={`${path}.${index}`} name={itemName(index)}>
              {renderItem(item, index)}
              <div className="flex flex-wrap gap-2">
                {reorder ? (
                  <>
                    <Button
                      variant="secondary"
                      size="sm"
                      disabled={index === 0}
                      aria-label={`Move ${itemName(index)} up`}
                      onClick={() => onChange(move(items, index, index - 1))}
                    >
                      Up
                    </Button>
                    <Button
                      variant="secondary"
                      size="sm"
                      disabled={index === items.length - 1}
                      aria-label={`Move ${itemName(index)} down`}
                      onClick={() => onChange(move(items, index, index + 1))}
                    >
                      Down
                    </Button>
                  </>
                ) : null}
                <Button
                  variant="danger"
                  size="sm"
                  disabled={items.length <= min}
                  aria-label={`Remove ${itemName(index)}`}
                  onClick={() => onChange(items.filter((_, j) => j !== index))}
                >
                  Remove
                </Button>
              </div>
            </ListItem>
          ))}
        </ol>
      ) : null}
      <div className="flex flex-wrap items-center gap-3">
        <Button variant="secondary" size="sm" disabled={items.length >= max} onClick={() => onChange([...items, newItem()])}>
          <PlusIcon className="size-4" />
          {addLabel}
        </Button>
        {items.length >= max ? <span className="text-sm text-ink-muted">At most {max}.</span> : null}
      </div>
    </fieldset>
  );
}

function ListItem({ path, name, children }: { path: string; name: string; children: ReactNode }) {
  const problems = useProblemsAt(path);
  return (
    <li
      aria-label={name}
      className={cn('flex flex-col gap-3 rounded-md border bg-surface p-3', problems ? 'border-danger' : 'border-line')}
    >
      <p className="text-sm font-bold text-ink-muted">{name}</p>
      <FieldError message={problems} />
      {children}
    </li>
  );
}
