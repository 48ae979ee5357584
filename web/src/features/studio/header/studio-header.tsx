import { Link } from 'react-router-dom';
import { Badge } from '@/components/ui/badge';
import { Button, buttonVariants } from '@/components/ui/button';
import type { SchoolClock } from '@/lib/format';
import type { SaveState } from '../draft/autosave';
import { SaveStatus } from './save-status';

type StudioHeaderProps = {
  title: string;
  publishedVersion: number | null;
  unpublishedChanges: boolean;
  saveState: SaveState;
  clock: SchoolClock;
  canUndo: boolean;
  canRedo: boolean;
  onUndo: () => void;
  onRedo: () => void;
  onRetry: () => void;
  onHelp: () => void;
  onPublish: () => void;
  previewTo: string;
  overviewTo: string;
};

/** The studio's top bar: which lesson, its version, saving, undo/redo, preview and publish. */
export function StudioHeader(props: StudioHeaderProps) {
  const version =
    props.publishedVersion === null
      ? 'Not published yet'
      : `Version ${props.publishedVersion} published${props.unpublishedChanges ? ' · draft has changes' : ' · draft matches it'}`;
  return (
    <header className="flex flex-wrap items-center gap-x-4 gap-y-2 border-b border-line pb-3">
      <div className="min-w-0 flex-1">
        <Link to={props.overviewTo} className="text-sm font-bold text-copper underline">
          Lesson overview
        </Link>
        <div className="flex flex-wrap items-center gap-2">
          <h1 className="truncate text-2xl">{props.title.trim() || 'Untitled lesson'}</h1>
          <Badge tone={props.publishedVersion === null ? 'neutral' : 'field'}>{version}</Badge>
        </div>
      </div>
      <SaveStatus state={props.saveState} clock={props.clock} onRetry={props.onRetry} />
      <div className="flex flex-wrap items-center gap-2">
        <Button size="sm" variant="secondary" onClick={props.onUndo} disabled={!props.canUndo} title="Undo (Ctrl+Z)">
          Undo
        </Button>
        <Button size="sm" variant="secondary" onClick={props.onRedo} disabled={!props.canRedo} title="Redo (Ctrl+Shift+Z)">
          Redo
        </Button>
        <Button size="sm" variant="ghost" onClick={props.onHelp} aria-keyshortcuts="?">
          Shortcuts
        </Button>
        <Link to={props.previewTo} className={buttonVariants({ variant: 'secondary', size: 'sm' })}>
          Preview as student
        </Link>
        <Button size="sm" onClick={props.onPublish}>
          Publish…
        </Button>
      </div>
    </header>
  );
}
