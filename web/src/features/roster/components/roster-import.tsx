import { useId, useState, type ChangeEvent } from 'react';
import { LIMITS } from '@core/limits';
import { ROSTER_COLUMNS, RosterUploadSchema, type RosterPreviewDto } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ErrorBanner } from '@/components/ui/error-banner';
import { FieldError } from '@/components/ui/field';
import { UploadIcon } from '@/components/ui/icons';
import { Textarea } from '@/components/ui/input';
import { LiveRegion } from '@/components/ui/live-region';
import { plural } from '@/lib/format';
import { useImportRoster } from '../api/import-roster';
import { usePreviewRoster } from '../api/preview-roster';
import { RosterPreviewTable } from './roster-preview-table';

const EXAMPLE = `${ROSTER_COLUMNS.join(',')}\nrowan.ashby@school.example,Rowan Ashby,student,Year 11 Physics\nmira.okafor@school.example,Mira Okafor,teacher;coordinator,`;

/** Import people from a CSV file: choose or paste, preview on the server, and import only a roster with no problems. */
export function RosterImport() {
  const fileId = useId();
  const textId = useId();
  const [csv, setCsv] = useState('');
  const [inputError, setInputError] = useState<string | undefined>();
  const [preview, setPreview] = useState<{ csv: string; result: RosterPreviewDto } | null>(null);
  const previewMutation = usePreviewRoster();
  const importMutation = useImportRoster();

  async function chooseFile(event: ChangeEvent<HTMLInputElement>) {
    const file = event.target.files?.[0];
    if (!file) return;
    if (file.size > LIMITS.rosterBytesMax) {
      setInputError(
        `“${file.name}” is ${Math.ceil(file.size / 1024)} KB; a roster file is at most ${LIMITS.rosterBytesMax / 1024} KB. Split it into smaller files.`,
      );
      return;
    }
    setInputError(undefined);
    setCsv(await file.text());
  }

  function runPreview() {
    importMutation.reset();
    const parsed = RosterUploadSchema.safeParse({ csv });
    if (!parsed.success) {
      setInputError(parsed.error.issues[0]?.message);
      return;
    }
    setInputError(undefined);
    previewMutation.mutate(parsed.data, { onSuccess: (result) => setPreview({ csv: parsed.data.csv, result }) });
  }

  function runImport() {
    if (!preview) return;
    importMutation.mutate({ csv: preview.csv }, { onSuccess: () => setPreview(null) });
  }

  const current = preview && preview.csv === csv ? preview.result : null;
  const badRows = current?.rows.filter((row) => row.errors.length > 0).length ?? 0;
  const canImport = Boolean(current?.valid) && !importMutation.isPending;

  return (
    <div className="flex flex-col gap-6">
      <section aria-labelledby="roster-source" className="flex flex-col gap-4">
        <h2 id="roster-source" className="text-2xl">
          1. Choose or paste the CSV
        </h2>
        <p>
          The first line names the columns <code className="font-mono">{ROSTER_COLUMNS.join(',')}</code>. Separate several roles with{' '}
          <code className="font-mono">;</code> or <code className="font-mono">|</code>. The class is optional and given by name.
        </p>
        <div className="flex flex-col gap-1">
          <label htmlFor={fileId} className="font-bold">
            CSV file
          </label>
          <input
            id={fileId}
            type="file"
            accept=".csv,text/csv,text/plain"
            onChange={(event) => void chooseFile(event)}
            className="max-w-full text-base file:mr-3 file:min-h-11 file:cursor-pointer file:rounded-md file:border file:border-line-strong file:bg-surface file:px-4 file:font-bold file:text-ink"
          />
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={textId} className="font-bold">
            Or paste it here
          </label>
          <Textarea
            id={textId}
            value={csv}
            onChange={(event) => setCsv(event.target.value)}
            rows={8}
            mono
            spellCheck={false}
            placeholder={EXAMPLE}
            invalid={Boolean(inputError)}
            className="text-sm"
          />
          <FieldError message={inputError} />
        </div>
        <div>
          <Button variant="secondary" onClick={runPreview} busy={previewMutation.isPending}>
            <UploadIcon className="size-5" />
            Check the roster
          </Button>
        </div>
        {previewMutation.isError ? <ErrorBanner error={previewMutation.error} title="The roster could not be checked" /> : null}
      </section>

      {current ? (
        <section aria-labelledby="roster-preview" className="flex flex-col gap-4">
          <h2 id="roster-preview" className="text-2xl">
            2. Check each row
          </h2>
          <LiveRegion>
            {current.valid ? (
              <Banner tone="success" title="Every row is ready">
                {plural(current.rows.length, 'row')} can be imported.
              </Banner>
            ) : (
              <Banner tone="error" title="Fix the roster before importing">
                {badRows > 0 ? `${plural(badRows, 'row has', 'rows have')} problems, marked below. ` : ''}
                Nothing is saved until every row is ready: correct the file, then check it again.
              </Banner>
            )}
          </LiveRegion>
          {current.errors.length > 0 ? (
            <ul className="list-disc pl-6 font-bold text-danger">
              {current.errors.map((message) => (
                <li key={message}>{message}</li>
              ))}
            </ul>
          ) : null}
          <RosterPreviewTable rows={current.rows} />
        </section>
      ) : preview ? (
        <Banner tone="info" title="The text changed since the check">
          Check the roster again to see the rows as they are now.
        </Banner>
      ) : null}

      <section aria-labelledby="roster-import" className="flex flex-col gap-3">
        <h2 id="roster-import" className="text-2xl">
          3. Import
        </h2>
        <p className="text-ink-muted">New people are invited by e-mail; students with a class are enrolled in it.</p>
        <div>
          <Button onClick={runImport} disabled={!canImport} busy={importMutation.isPending}>
            Import roster
          </Button>
        </div>
        {!current?.valid && !importMutation.isSuccess ? (
          <p className="text-sm text-ink-muted">Available once a check finds no problems.</p>
        ) : null}
        {importMutation.isError ? <ErrorBanner error={importMutation.error} title="Nothing was imported" /> : null}
        <LiveRegion>
          {importMutation.isSuccess ? (
            <Banner tone="success" title="Roster imported">
              {plural(importMutation.data.invited, 'person', 'people')} invited, {plural(importMutation.data.enrolled, 'enrolment')} made.
            </Banner>
          ) : null}
        </LiveRegion>
      </section>
    </div>
  );
}
