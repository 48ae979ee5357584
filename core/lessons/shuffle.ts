import { cyrb53, mulberry32 } from '../physics/units/draw-variables';

/** A copy of `items` in an order fixed by `seed` (Fisher–Yates over the engine's mulberry32 stream). */
export function seededShuffle<T>(items: readonly T[], seed: string): T[] {
  const out = [...items];
  const random = mulberry32(cyrb53(seed));
  for (let i = out.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [out[i], out[j]] = [out[j] as T, out[i] as T];
  }
  return out;
}
