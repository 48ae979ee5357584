import { createColumnHelper, type ColumnDef } from '@tanstack/react-table';
import { createContext, useContext } from 'react';
import type { RecordingDto } from '@core/contracts';
import { formatBytes, formatDuration } from '@core/recordings';
import { DataTable } from '@/components/ui/data-table';
import { formatDate, type SchoolClock } from '@/lib/format';
import { DeleteRecording } from './delete-recording';
import { RecordingPoster } from './recording-poster';
import { RecordingState } from './recording-state';
import { RecordingTitle } from './recording-title';
import { RecordingUsedBy } from './recording-used-by';

type TableContext = {
  clock: SchoolClock;
  /** Upload percent of recordings being sent from this page, by recording id. */
  uploadPercents: Map<string, number>;
};

// Cells read what changes (progress, the clock) from context: the columns stay the same objects between
// renders, so a cell's own state (a rename in progress) survives the library's refreshes.
const Context = createContext<TableContext>({ clock: { timeZone: 'UTC', locale: 'en-GB' }, uploadPercents: new Map() });

function StateCell({ recording }: { recording: RecordingDto }) {
  const { uploadPercents } = useContext(Context);
  return <RecordingState recording={recording} uploadPercent={uploadPercents.get(recording.id)} />;
}

function DateCell({ iso }: { iso: string }) {
  const { clock } = useContext(Context);
  return <span className="text-sm whitespace-nowrap">{formatDate(iso, clock)}</span>;
}

function ActionsCell({ recording }: { recording: RecordingDto }) {
  const { uploadPercents } = useContext(Context);
  return uploadPercents.has(recording.id) ? null : <DeleteRecording recording={recording} />;
}

const column = createColumnHelper<RecordingDto>();

const COLUMNS: ColumnDef<RecordingDto, unknown>[] = [
  column.display({
    id: 'recording',
    header: 'Recording',
    cell: ({ row }) => (
      <div className="flex items-start gap-3 sm:min-w-64">
        <RecordingPoster url={row.original.posterUrl} title={row.original.title} className="w-20 sm:w-28" />
        <div className="min-w-0 break-words">
          <RecordingTitle recording={row.original} />
          {row.original.originalFileName !== row.original.title ? (
            <div className="text-sm break-all text-ink-muted">{row.original.originalFileName}</div>
          ) : null}
          <RecordingUsedBy recording={row.original} className="mt-1" />
        </div>
      </div>
    ),
  }),
  column.display({ id: 'state', header: 'State', cell: ({ row }) => <StateCell recording={row.original} /> }),
  column.display({
    id: 'duration',
    header: 'Length',
    cell: ({ row }) => (
      <span className="font-mono text-sm">
        {row.original.durationSeconds === null ? '—' : formatDuration(row.original.durationSeconds)}
      </span>
    ),
  }),
  column.display({
    id: 'size',
    header: 'Size',
    cell: ({ row }) => <span className="text-sm whitespace-nowrap">{formatBytes(row.original.sizeBytes)}</span>,
  }),
  column.display({
    id: 'owner',
    header: 'Uploaded by',
    cell: ({ row }) => <span className="text-sm">{row.original.owner?.name ?? 'A former member of staff'}</span>,
  }),
  column.display({ id: 'date', header: 'Added', cell: ({ row }) => <DateCell iso={row.original.createdAt} /> }),
  column.display({
    id: 'actions',
    header: () => <span className="sr-only">Actions</span>,
    cell: ({ row }) => <ActionsCell recording={row.original} />,
  }),
];

/** The library as a table; a recording being sent from this page is cancelled in the upload list, not here. */
export function RecordingTable({ recordings, empty, clock, uploadPercents }: TableContext & { recordings: RecordingDto[]; empty: string }) {
  return (
    <Context.Provider value={{ clock, uploadPercents }}>
      <DataTable data={recordings} columns={COLUMNS} caption="Recordings" getRowId={(recording) => recording.id} empty={empty} />
    </Context.Provider>
  );
}
