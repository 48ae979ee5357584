const MIB = 1024 * 1024;

/** S3 refuses parts under 5 MiB (except the last) and more than 10,000 parts. */
export const S3_MIN_PART_BYTES = 5 * MIB;
export const S3_MAX_PARTS = 10_000;

const MIN_PART = 8 * MIB;
const MAX_PART = 512 * MIB;
/** About this many parts: enough to resume cheaply, few enough to sign quickly. */
const TARGET_PARTS = 128;

/** The part size for a file: a power of two from 8 MiB up, growing with the file. */
export function partSizeFor(fileSize: number): number {
  let size = MIN_PART;
  while (size < MAX_PART && size * TARGET_PARTS < fileSize) size *= 2;
  return Math.max(size, Math.ceil(fileSize / S3_MAX_PARTS));
}

export function partCountFor(fileSize: number, partSize: number): number {
  return Math.max(1, Math.ceil(fileSize / partSize));
}

/** Byte length of one part (1-based): every part is full except possibly the last. */
export function partLength(fileSize: number, partSize: number, partNumber: number): number {
  const start = (partNumber - 1) * partSize;
  return Math.max(0, Math.min(partSize, fileSize - start));
}
