import { useEffect, useLayoutEffect, useRef, useState, type MouseEvent } from 'react';
import type { Chapter, Checkpoint } from '@core/contracts';
import { Button } from '@/components/ui/button';
import { PlusIcon, SearchIcon } from '@/components/ui/icons';
import { formatTime } from '../time/format-time';
import { ChapterLane, type TimeRange } from './chapter-lane';
import { MarkerLane } from './marker-lane';
import { ThumbnailStrip } from './thumbnail-strip';
import type { ThumbnailTile } from './thumbnails';
import { TimeRuler } from './time-ruler';
import { followPlayhead, scrollAfterZoom, timeToX, timelineWidth, xToTime, zoomIn, zoomOut, ZOOM_LEVELS } from './timeline-math';
import { useElementWidth } from './use-element-width';

export type TimelineProps = {
  durationMs: number;
  frameRate: number;
  currentMs: number;
  checkpoints: readonly Checkpoint[];
  chapters: readonly Chapter[];
  selectedCheckpoint: string | null;
  selectedChapter: string | null;
  problemKeys: ReadonlySet<string>;
  zoom: number;
  onZoom: (zoom: number) => void;
  tiles: readonly ThumbnailTile[] | null;
  /** Why there is no strip (no thumbnails yet, or they failed to load), or null. */
  tilesNote: string | null;
  range: TimeRange | null;
  onRange: (range: TimeRange | null) => void;
  onSeek: (ms: number) => void;
  onSelectCheckpoint: (key: string) => void;
  onSelectChapter: (key: string) => void;
  onMoveCheckpoint: (key: string, atMs: number) => void;
  onAddChapter: () => void;
};

/** The recording's timeline under the player: ruler, thumbnails, chapters, checkpoint markers and the playhead. */
export function Timeline(props: TimelineProps) {
  const { durationMs, currentMs, zoom, onZoom, onSeek } = props;
  const scrollRef = useRef<HTMLDivElement>(null);
  const viewWidth = useElementWidth(scrollRef);
  const [scrollLeft, setScrollLeft] = useState(0);
  const width = timelineWidth(viewWidth, zoom);
  const scale = { durationMs, widthPx: width };
  const playheadX = timeToX(currentMs, scale);

  // Keep the playhead in view as the video plays or seeks (and after zooming).
  useEffect(() => {
    const element = scrollRef.current;
    if (!element) return;
    const next = followPlayhead(element.scrollLeft, playheadX, viewWidth, width);
    if (next !== element.scrollLeft) element.scrollLeft = next;
  }, [playheadX, viewWidth, width]);

  // Ctrl (or Cmd) + wheel zooms around the pointer; a plain wheel scrolls as usual. React's wheel
  // listener is passive, so the page's own zoom can only be prevented from a native listener.
  const latest = useRef({ zoom, width, viewWidth, onZoom });
  useLayoutEffect(() => {
    latest.current = { zoom, width, viewWidth, onZoom };
  });
  const pendingScroll = useRef<number | null>(null);
  useEffect(() => {
    const element = scrollRef.current;
    if (!element) return;
    const onWheel = (event: WheelEvent) => {
      if (!event.ctrlKey && !event.metaKey) return;
      event.preventDefault();
      const { zoom: current, width: oldWidth, viewWidth: view, onZoom: setZoom } = latest.current;
      const next = event.deltaY < 0 ? zoomIn(current) : zoomOut(current);
      if (next === current) return;
      const anchor = event.clientX - element.getBoundingClientRect().left;
      pendingScroll.current = scrollAfterZoom(element.scrollLeft, anchor, oldWidth, timelineWidth(view, next), view);
      setZoom(next);
    };
    element.addEventListener('wheel', onWheel, { passive: false });
    return () => element.removeEventListener('wheel', onWheel);
  }, []);
  useEffect(() => {
    const element = scrollRef.current;
    if (element && pendingScroll.current !== null) {
      element.scrollLeft = pendingScroll.current;
      pendingScroll.current = null;
    }
  }, [width]);

  function seekFromClick(event: MouseEvent<HTMLDivElement>) {
    const left = event.currentTarget.getBoundingClientRect().left;
    onSeek(xToTime(event.clientX - left, scale));
  }

  return (
    <section aria-label="Timeline" className="rounded-lg border border-line bg-surface">
      <div className="flex flex-wrap items-center gap-2 border-b border-line px-3 py-2">
        <h2 className="mr-auto text-base">
          Timeline <span className="font-normal text-ink-muted">· playhead {formatTime(currentMs)}</span>
        </h2>
        <Button size="sm" variant="secondary" onClick={props.onAddChapter}>
          <PlusIcon className="size-4" />
          {props.range ? `Chapter from ${formatTime(props.range.startMs)} to ${formatTime(props.range.endMs)}` : 'Add chapter here'}
        </Button>
        {props.range ? (
          <Button size="sm" variant="ghost" onClick={() => props.onRange(null)}>
            Clear marked range
          </Button>
        ) : null}
        <div className="flex items-center gap-1" role="group" aria-label="Zoom">
          <Button
            size="sm"
            variant="secondary"
            onClick={() => onZoom(zoomOut(zoom))}
            disabled={zoom <= ZOOM_LEVELS[0]}
            aria-label="Zoom out"
          >
            −
          </Button>
          <span className="min-w-14 text-center text-sm font-bold" aria-live="polite">
            <SearchIcon className="mr-1 inline size-4" />
            {zoom}×
          </span>
          <Button
            size="sm"
            variant="secondary"
            onClick={() => onZoom(zoomIn(zoom))}
            disabled={zoom >= ZOOM_LEVELS[ZOOM_LEVELS.length - 1]!}
            aria-label="Zoom in"
          >
            +
          </Button>
        </div>
      </div>
      <div
        ref={scrollRef}
        className="relative overflow-x-auto overflow-y-hidden"
        onScroll={(event) => setScrollLeft(event.currentTarget.scrollLeft)}
      >
        <div className="relative" style={{ width }}>
          {/* Clicking the ruler or the thumbnails seeks there; the keyboard seeks with the player's own controls and [ ]. */}
          <div onClick={seekFromClick} className="cursor-pointer" data-testid="seek-strip">
            <TimeRuler scale={scale} viewStart={scrollLeft} viewWidth={viewWidth} />
            {props.tiles && props.tiles.length > 0 ? (
              <ThumbnailStrip tiles={props.tiles} scale={scale} viewStart={scrollLeft} viewWidth={viewWidth} />
            ) : null}
          </div>
          <ChapterLane
            chapters={props.chapters}
            scale={scale}
            frameRate={props.frameRate}
            selectedKey={props.selectedChapter}
            problemKeys={props.problemKeys}
            range={props.range}
            onRange={props.onRange}
            onSelect={props.onSelectChapter}
          />
          <MarkerLane
            checkpoints={props.checkpoints}
            scale={scale}
            frameRate={props.frameRate}
            selectedKey={props.selectedCheckpoint}
            problemKeys={props.problemKeys}
            onSelect={props.onSelectCheckpoint}
            onMove={props.onMoveCheckpoint}
          />
          <div aria-hidden="true" className="pointer-events-none absolute inset-y-0 z-40 w-0.5 bg-danger" style={{ left: playheadX }}>
            <span className="absolute -top-0 -left-1.5 size-3.5 rotate-45 bg-danger" />
          </div>
        </div>
      </div>
      {props.tilesNote ? <p className="px-3 py-1.5 text-sm text-ink-muted">{props.tilesNote}</p> : null}
      {props.checkpoints.length === 0 ? (
        <p className="px-3 pb-2 text-sm text-ink-muted">No checkpoints yet: play to a moment and use Pin (or press P and a number).</p>
      ) : null}
    </section>
  );
}
