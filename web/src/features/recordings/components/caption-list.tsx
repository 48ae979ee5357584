import { createColumnHelper, type ColumnDef } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import type { CaptionDto } from '@core/contracts';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { FieldError } from '@/components/ui/field';
import { plural } from '@/lib/format';
import { useDeleteCaption } from '../api/delete-caption';
import { useUpdateCaption } from '../api/update-caption';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';

const column = createColumnHelper<CaptionDto>();

function columnsFor(recordingId: string, canEdit: boolean): ColumnDef<CaptionDto, unknown>[] {
  return [
    column.display({ id: 'language', header: 'Language', cell: ({ row }) => <code className="font-mono">{row.original.language}</code> }),
    column.display({ id: 'label', header: 'Label', cell: ({ row }) => row.original.label }),
    column.display({ id: 'cues', header: 'Cues', cell: ({ row }) => plural(row.original.cueCount, 'cue') }),
    column.display({
      id: 'default',
      header: 'Shown first',
      cell: ({ row }) =>
        row.original.isDefault ? (
          <Badge tone="success">Default</Badge>
        ) : canEdit ? (
          <MakeDefault recordingId={recordingId} caption={row.original} />
        ) : null,
    }),
    column.display({
      id: 'actions',
      header: () => <span className="sr-only">Actions</span>,
      cell: ({ row }) => (canEdit ? <DeleteCaption recordingId={recordingId} caption={row.original} /> : null),
    }),
  ];
}

function MakeDefault({ recordingId, caption }: { recordingId: string; caption: CaptionDto }) {
  const mutation = useUpdateCaption(recordingId);
  return (
    <div className="flex flex-col items-start gap-1">
      <Button
        size="sm"
        variant="secondary"
        busy={mutation.isPending}
        onClick={() => mutation.mutate({ captionId: caption.id, isDefault: true })}
        aria-label={`Make ${caption.label} the default captions`}
      >
        Make default
      </Button>
      <FieldError message={mutation.isError ? mutation.error.message : undefined} />
    </div>
  );
}

function DeleteCaption({ recordingId, caption }: { recordingId: string; caption: CaptionDto }) {
  const [confirming, setConfirming] = useState(false);
  const mutation = useDeleteCaption(recordingId);
  return (
    <>
      <Button size="sm" variant="danger" onClick={() => setConfirming(true)} aria-label={`Delete the ${caption.label} captions`}>
        Delete
      </Button>
      <ConfirmDialog
        open={confirming}
        title={`Delete the “${caption.label}” captions?`}
        confirmLabel="Delete the captions"
        cancelLabel="Keep them"
        busy={mutation.isPending}
        error={mutation.isError ? mutation.error.message : undefined}
        onConfirm={() => mutation.mutate(caption.id, { onSuccess: () => setConfirming(false) })}
        onCancel={() => {
          mutation.reset();
          setConfirming(false);
        }}
      >
        Viewers can no longer choose them. To bring them back, upload the WebVTT file again.
      </ConfirmDialog>
    </>
  );
}

/** The caption tracks of a recording: language, label, number of cues, which one is shown first. */
export function CaptionList({ recordingId, captions, canEdit }: { recordingId: string; captions: CaptionDto[]; canEdit: boolean }) {
  // The same column objects between renders, so a cell's state (an open confirmation) survives a refresh.
  const columns = useMemo(() => columnsFor(recordingId, canEdit), [recordingId, canEdit]);
  return <DataTable data={captions} columns={columns} caption="Captions" getRowId={(caption) => caption.id} empty="No captions yet." />;
}
