import type { MediaProbe } from './probe';

/**
 * The web rendition's limits. 1280x720 at about 2.5 Mb/s plays on school Wi-Fi and every browser;
 * H.264 High profile with AAC in MP4 is what all current browsers decode (common practice).
 */
export const RENDITION = {
  /** Long and short side of the box the picture must fit (720x1280 for portrait). */
  maxLongSide: 1280,
  maxShortSide: 720,
  /**
   * Frame-rate cap. 60, not 30: motion in a physics demonstration is often stepped through frame by
   * frame, and 1280x720 at 60 fps is within H.264 level 3.2, which browsers decode.
   */
  maxFrameRate: 60,
  /** Quality-targeted encoding (CRF) capped by maxrate/bufsize: plain scenes take less than the cap. */
  crf: 23,
  maxrateKbps: 2500,
  bufsizeKbps: 5000,
  audioKbps: 128,
  /** A source already this lean (overall bits/s) is remuxed rather than re-encoded. */
  remuxMaxBitrate: 3_000_000,
  /** Key frame every 2 s, so seeking in the player lands close to where it was asked. */
  keyframeSeconds: 2,
} as const;

export const TILE_WIDTH = 160;
/** At most 10x10 tiles on one thumbnail sheet. */
export const TILE_GRID_MAX = 10;

/** The poster frame's time: 3 s in, or half-way through a shorter clip (past the end ffmpeg writes nothing). */
export function posterTime(durationSeconds: number): number {
  return Math.min(3, durationSeconds / 2);
}

/**
 * Seconds between thumbnail tiles, from the duration, so a long recording does not make hundreds
 * of sheets while a short one still gets a tile for every second of scrubbing:
 * up to 1 min: 1 s; up to 5 min: 2 s; up to 20 min: 5 s; up to 1 h: 10 s; up to 2 h: 20 s; longer: 30 s.
 */
export function thumbnailInterval(durationSeconds: number): number {
  if (durationSeconds <= 60) return 1;
  if (durationSeconds <= 5 * 60) return 2;
  if (durationSeconds <= 20 * 60) return 5;
  if (durationSeconds <= 60 * 60) return 10;
  if (durationSeconds <= 2 * 60 * 60) return 20;
  return 30;
}

export interface ThumbnailPlan {
  intervalSeconds: number;
  columns: number;
  rows: number;
  tileWidth: number;
  tileHeight: number;
  /** Tiles the duration calls for: one at 0, interval, 2 x interval ... before the end. */
  expectedTiles: number;
}

/** The grid: as many columns as tiles up to 10, as many rows as needed up to 10 (a 4 s clip gets 4x1). */
export function planThumbnails(durationSeconds: number, displayWidth: number, displayHeight: number): ThumbnailPlan {
  const intervalSeconds = thumbnailInterval(durationSeconds);
  const expectedTiles = Math.max(1, Math.ceil(durationSeconds / intervalSeconds - 1e-6));
  const columns = Math.min(TILE_GRID_MAX, expectedTiles);
  const rows = Math.min(TILE_GRID_MAX, Math.ceil(expectedTiles / columns));
  return {
    intervalSeconds,
    columns,
    rows,
    tileWidth: TILE_WIDTH,
    tileHeight: even((TILE_WIDTH * displayHeight) / displayWidth),
    expectedTiles,
  };
}

/** The rendition's size: the picture as shown, fitted in 1280x720 (720x1280 if portrait), never enlarged, even sides. */
export function fitRendition(displayWidth: number, displayHeight: number): { width: number; height: number } {
  const portrait = displayHeight > displayWidth;
  const boxWidth = portrait ? RENDITION.maxShortSide : RENDITION.maxLongSide;
  const boxHeight = portrait ? RENDITION.maxLongSide : RENDITION.maxShortSide;
  const scale = Math.min(1, boxWidth / displayWidth, boxHeight / displayHeight);
  return { width: even(displayWidth * scale), height: even(displayHeight * scale) };
}

const STANDARD_RATES: [number, string][] = [
  [24000 / 1001, '24000/1001'],
  [24, '24'],
  [25, '25'],
  [30000 / 1001, '30000/1001'],
  [30, '30'],
  [48, '48'],
  [50, '50'],
  [60000 / 1001, '60000/1001'],
  [60, '60'],
];

/**
 * The rate of the picture as shown: an interlaced source becomes one frame per field (25i -> 50p),
 * so motion keeps every moment the camera caught.
 */
export function shownFrameRate(probe: Pick<MediaProbe, 'frameRate' | 'interlaced'>): number {
  return probe.interlaced ? probe.frameRate * 2 : probe.frameRate;
}

/**
 * The rendition's constant frame rate, as an ffmpeg `-r` value: the source's average rate, divided
 * evenly below the cap (120 -> 60, 100 -> 50), snapped to the nearest standard rate when within 2 %
 * (a phone's variable 29.7 becomes 30000/1001).
 */
export function targetFrameRate(sourceRate: number): { value: number; expression: string } {
  if (!(sourceRate > 0) || !Number.isFinite(sourceRate)) return { value: 30, expression: '30' };
  const rate = sourceRate > RENDITION.maxFrameRate ? sourceRate / Math.ceil(sourceRate / RENDITION.maxFrameRate) : sourceRate;
  const nearest = [...STANDARD_RATES].sort(([a], [b]) => Math.abs(rate - a) - Math.abs(rate - b))[0]!;
  if (Math.abs(rate - nearest[0]) / nearest[0] < 0.02) return { value: nearest[0], expression: nearest[1] };
  const rounded = Math.round(rate * 1000) / 1000;
  return { value: rounded, expression: String(rounded) };
}

/**
 * Why the source cannot be copied as the rendition (empty: remux). `constantFrameRate` is measured
 * from the packets (probe.ts) only when everything else already fits.
 */
export function remuxBlockers(probe: MediaProbe, constantFrameRate: boolean): string[] {
  const blockers: string[] = [];
  if (probe.videoCodec !== 'h264') blockers.push(`video codec ${probe.videoCodec}`);
  if (probe.pixelFormat !== 'yuv420p') blockers.push(`pixel format ${probe.pixelFormat}`);
  if (probe.audioCodec !== null && probe.audioCodec !== 'aac') blockers.push(`audio codec ${probe.audioCodec}`);
  if (probe.rotation !== 0) blockers.push(`rotation ${probe.rotation}`);
  const quarterTurn = probe.rotation === 90 || probe.rotation === 270;
  const shownWidth = quarterTurn ? probe.displayHeight : probe.displayWidth;
  if (shownWidth !== probe.width) blockers.push('non-square pixels');
  const fitted = fitRendition(probe.width, probe.height);
  if (fitted.width !== probe.width || fitted.height !== probe.height) blockers.push(`size ${probe.width}x${probe.height}`);
  if (probe.interlaced) blockers.push('interlaced');
  if (probe.frameRate > RENDITION.maxFrameRate) blockers.push(`frame rate ${probe.frameRate.toFixed(2)}`);
  if (!constantFrameRate) blockers.push('variable frame rate');
  if (probe.bitrate > RENDITION.remuxMaxBitrate) blockers.push(`bitrate ${Math.round(probe.bitrate / 1000)} kb/s`);
  return blockers;
}

function even(value: number): number {
  return Math.max(2, 2 * Math.round(value / 2));
}
