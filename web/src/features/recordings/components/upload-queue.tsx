import { Button } from '@/components/ui/button';
import type { UploadRow } from '../upload/upload-manager';
import { UploadRowView, type UploadRowActions } from './upload-row';

/** The files of this visit: being sent, paused, failed or just finished. */
export function UploadQueue({ rows, actions }: { rows: UploadRow[]; actions: UploadRowActions }) {
  if (rows.length === 0) return null;
  const finished = rows.filter((row) => row.status === 'done');
  return (
    <div className="flex flex-col gap-2">
      <ul aria-label="Files being uploaded" className="rounded-lg border border-line bg-surface">
        {rows.map((row) => (
          <UploadRowView key={row.id} row={row} actions={actions} />
        ))}
      </ul>
      {finished.length > 1 ? (
        <div>
          <Button size="sm" variant="ghost" onClick={() => finished.forEach((row) => actions.dismiss(row.id))}>
            Clear finished uploads
          </Button>
        </div>
      ) : null}
    </div>
  );
}
