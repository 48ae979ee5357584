import { useId } from 'react';
import { RichText } from '@/components/rich-text/rich-text';
import { cn } from '@/lib/cn';

type ChoiceListProps = {
  legend: string;
  options: { id: string; text: string }[];
  several: boolean;
  chosen: readonly string[];
  disabled: boolean;
  onChange: (chosen: string[]) => void;
  /** Option text is teacher Markdown; sign choices are plain labels. */
  markdown?: boolean;
  describedBy?: string;
};

/** Radio buttons or checkboxes with large touch targets; the server already put the options in this student's order. */
export function ChoiceList({ legend, options, several, chosen, disabled, onChange, markdown = true, describedBy }: ChoiceListProps) {
  const name = useId();
  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={describedBy}>
      <legend className="mb-1 font-bold">{legend}</legend>
      {options.map((option) => {
        const checked = chosen.includes(option.id);
        return (
          <label
            key={option.id}
            className={cn(
              'flex min-h-12 cursor-pointer items-start gap-3 rounded-md border px-3 py-2',
              checked ? 'border-teal border-2 bg-teal-soft' : 'border-line-strong bg-surface',
              disabled && 'cursor-default opacity-80',
            )}
          >
            <input
              type={several ? 'checkbox' : 'radio'}
              name={name}
              value={option.id}
              checked={checked}
              disabled={disabled}
              className="mt-1 size-5 shrink-0 accent-teal"
              onChange={(event) => {
                if (!several) onChange([option.id]);
                else onChange(event.target.checked ? [...chosen, option.id] : chosen.filter((id) => id !== option.id));
              }}
            />
            {markdown ? (
              <RichText markdown={option.text} className="min-w-0 flex-1" />
            ) : (
              <span className="min-w-0 flex-1">{option.text}</span>
            )}
          </label>
        );
      })}
    </fieldset>
  );
}
