import { parseVtt } from '../transcript/parse-vtt';

/** One tile of a sprite sheet and the time range it stands for. */
export type ThumbnailTile = { startMs: number; endMs: number; url: string; x: number; y: number; width: number; height: number };

// The API's thumbnails track: cue payload `<sheet url>#xywh=x,y,w,h` (W3C Media Fragments URI 1.0, §4.2.2).
const XYWH = /^(.*)#xywh=(\d+),(\d+),(\d+),(\d+)$/;

/** Reads the thumbnails WebVTT track; cues without a usable `#xywh=` fragment are skipped. */
export function parseThumbnails(text: string): ThumbnailTile[] {
  const tiles: ThumbnailTile[] = [];
  for (const cue of parseVtt(text, 'metadata').cues) {
    const match = XYWH.exec(cue.text);
    if (!match) continue;
    const [, url, x, y, w, h] = match;
    if (!url || Number(w) === 0 || Number(h) === 0) continue;
    tiles.push({ startMs: cue.startMs, endMs: cue.endMs, url, x: Number(x), y: Number(y), width: Number(w), height: Number(h) });
  }
  return tiles.sort((a, b) => a.startMs - b.startMs);
}

/** The tile covering `ms`, or the nearest one before it (tiles are sorted by start). */
export function tileAt(tiles: readonly ThumbnailTile[], ms: number): ThumbnailTile | null {
  let found: ThumbnailTile | null = null;
  for (const tile of tiles) {
    if (tile.startMs > ms) break;
    found = tile;
  }
  return found ?? tiles[0] ?? null;
}
