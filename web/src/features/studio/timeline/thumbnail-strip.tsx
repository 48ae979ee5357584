import type { ThumbnailTile } from './thumbnails';
import { tileAt } from './thumbnails';
import { xToTime, type TimelineScale } from './timeline-math';

const STRIP_HEIGHT = 44;

type ThumbnailStripProps = {
  tiles: readonly ThumbnailTile[];
  scale: TimelineScale;
  /** Only tiles in view are drawn: at high zoom a long recording would otherwise need thousands. */
  viewStart: number;
  viewWidth: number;
};

/** Frames of the recording along the timeline, each tile cut from its sprite sheet with CSS. */
export function ThumbnailStrip({ tiles, scale, viewStart, viewWidth }: ThumbnailStripProps) {
  const first = tiles[0];
  if (!first) return null;
  const zoomFactor = STRIP_HEIGHT / first.height;
  const slotWidth = Math.max(24, Math.round(first.width * zoomFactor));
  const firstSlot = Math.max(0, Math.floor(viewStart / slotWidth) - 1);
  const lastSlot = Math.min(Math.ceil(scale.widthPx / slotWidth), Math.ceil((viewStart + viewWidth) / slotWidth) + 1);
  const slots: { index: number; tile: ThumbnailTile }[] = [];
  for (let index = firstSlot; index < lastSlot; index++) {
    const tile = tileAt(tiles, xToTime((index + 0.5) * slotWidth, scale));
    if (tile) slots.push({ index, tile });
  }
  return (
    <div className="relative overflow-hidden bg-ink" style={{ height: STRIP_HEIGHT }} aria-hidden="true" data-testid="thumbnail-strip">
      {slots.map(({ index, tile }) => {
        const scaleBy = STRIP_HEIGHT / tile.height;
        return (
          <div
            key={index}
            className="absolute top-0 overflow-hidden"
            style={{ left: index * slotWidth, width: slotWidth, height: STRIP_HEIGHT }}
          >
            <div
              style={{
                width: tile.width,
                height: tile.height,
                backgroundImage: `url("${tile.url.replace(/"/g, '%22')}")`,
                backgroundPosition: `${-tile.x}px ${-tile.y}px`,
                transform: `scale(${scaleBy})`,
                transformOrigin: 'top left',
              }}
            />
          </div>
        );
      })}
    </div>
  );
}
