import { z } from 'zod';

/** What the worker stores in `recordings.thumbnails`: the tile grid and each sprite sheet's key. */
export const ThumbnailGridSchema = z.object({
  intervalSeconds: z.number().positive(),
  columns: z.number().int().positive(),
  rows: z.number().int().positive(),
  tileWidth: z.number().int().positive(),
  tileHeight: z.number().int().positive(),
  sheets: z.array(z.object({ key: z.string().min(1), tiles: z.number().int().positive() })).min(1),
});
export type ThumbnailGrid = z.infer<typeof ThumbnailGridSchema>;

/** The stored grid, or null when there is none or it is not in the expected shape. */
export function parseThumbnailGrid(value: unknown): ThumbnailGrid | null {
  const parsed = ThumbnailGridSchema.safeParse(value);
  return parsed.success ? parsed.data : null;
}

/** 75.5 -> "00:01:15.500" (a "WebVTT timestamp" of the W3C WebVTT spec, hours always shown). */
export function vttTimestamp(seconds: number): string {
  const millis = Math.max(0, Math.round(seconds * 1000));
  const h = Math.floor(millis / 3_600_000);
  const m = Math.floor((millis % 3_600_000) / 60_000);
  const s = Math.floor((millis % 60_000) / 1000);
  const ms = millis % 1000;
  const pad = (n: number, width = 2) => String(n).padStart(width, '0');
  return `${pad(h)}:${pad(m)}:${pad(s)}.${pad(ms, 3)}`;
}

/**
 * A WebVTT thumbnails track: one cue per tile covering that tile's time range, its payload the
 * sheet URL with a media fragment `#xywh=x,y,w,h` (W3C Media Fragments URI 1.0, §4.2.2). The last
 * cue ends at the duration; tiles past it are left out. `sheetUrls[i]` is sheet i's signed URL.
 */
export function buildThumbnailsVtt(grid: ThumbnailGrid, durationSeconds: number, sheetUrls: string[]): string {
  const cues: string[] = [];
  let tileIndex = 0;
  grid.sheets.forEach((sheet, sheetIndex) => {
    const url = sheetUrls[sheetIndex]!;
    const onSheet = Math.min(sheet.tiles, grid.columns * grid.rows);
    for (let tile = 0; tile < onSheet; tile++, tileIndex++) {
      const start = tileIndex * grid.intervalSeconds;
      if (start >= durationSeconds) return;
      const end = Math.min(start + grid.intervalSeconds, durationSeconds);
      const x = (tile % grid.columns) * grid.tileWidth;
      const y = Math.floor(tile / grid.columns) * grid.tileHeight;
      cues.push(`${vttTimestamp(start)} --> ${vttTimestamp(end)}\n${url}#xywh=${x},${y},${grid.tileWidth},${grid.tileHeight}`);
    }
  });
  // The last tile stands for the rest of the recording, however the interval divides it.
  if (cues.length > 0) {
    const last = cues.length - 1;
    cues[last] = cues[last]!.replace(/ --> [^\n]+/, ` --> ${vttTimestamp(durationSeconds)}`);
  }
  return `WEBVTT\n\n${cues.join('\n\n')}\n`;
}
