import { ValidationError } from '../../errors';
import type { StoredPart } from '../../storage/object-storage';

/** S3 returns ETags in quotes; browsers pass them on as they got them, with or without. */
function bareEtag(etag: string): string {
  return etag.trim().replace(/^W\//, '').replace(/^"|"$/g, '');
}

/** "2", "2 and 5", "2, 5 and 7", "2, 5, 7, … and 12 more": part numbers in a sentence. */
function numbers(list: number[]): string {
  const shown = list.slice(0, 10).map(String);
  if (list.length > 10) return `${shown.join(', ')} and ${list.length - 10} more`;
  return shown.length === 1 ? shown[0]! : `${shown.slice(0, -1).join(', ')} and ${shown.at(-1)}`;
}

const DETAILS_MAX = 50;

/**
 * Checks the browser's list of parts against what storage holds: every part 1..partCount must be
 * stored, and the browser's ETag for it must be the stored one. Returns the error to answer with,
 * or null when the parts may be joined.
 */
export function partProblems(
  partCount: number,
  stored: StoredPart[],
  sent: { partNumber: number; etag: string }[],
): ValidationError | null {
  const beyond = [...new Set(sent.map((part) => part.partNumber).filter((n) => n > partCount))].sort((a, b) => a - b);
  if (beyond.length > 0) {
    const message = `This upload has ${partCount} part${partCount === 1 ? '' : 's'}: part${beyond.length === 1 ? '' : 's'} ${numbers(beyond)} do${beyond.length === 1 ? 'es' : ''} not belong to it.`;
    return new ValidationError(message, [{ path: 'parts', message }]);
  }
  const storedEtags = new Map(stored.map((part) => [part.partNumber, bareEtag(part.etag)]));
  const missing: number[] = [];
  for (let n = 1; n <= partCount; n++) if (!storedEtags.has(n)) missing.push(n);
  if (missing.length > 0) {
    const message = `Part${missing.length === 1 ? '' : 's'} ${numbers(missing)} of ${partCount} ${missing.length === 1 ? 'is' : 'are'} not stored yet: send ${missing.length === 1 ? 'it' : 'them'}, then finish the upload.`;
    const details = missing.slice(0, DETAILS_MAX).map((n) => ({ path: 'parts', message: `Part ${n} is not stored.` }));
    return new ValidationError(message, details, 'parts_missing');
  }
  const sentEtags = new Map(sent.map((part) => [part.partNumber, bareEtag(part.etag)]));
  const differing: number[] = [];
  for (let n = 1; n <= partCount; n++) if (sentEtags.get(n) !== storedEtags.get(n)) differing.push(n);
  if (differing.length > 0) {
    const message = `Part${differing.length === 1 ? '' : 's'} ${numbers(differing)} of ${partCount} ${differing.length === 1 ? 'does' : 'do'} not match what storage holds: send ${differing.length === 1 ? 'it' : 'them'} again, then finish the upload.`;
    const details = differing.slice(0, DETAILS_MAX).map((n) => ({
      path: 'parts',
      message: sentEtags.has(n) ? `Part ${n} has another ETag in storage.` : `Part ${n} is missing from the list.`,
    }));
    return new ValidationError(message, details, 'parts_mismatch');
  }
  return null;
}

/** The stored parts to join, in order: exactly 1..partCount. */
export function partsToJoin(partCount: number, stored: StoredPart[]): StoredPart[] {
  return stored.filter((part) => part.partNumber >= 1 && part.partNumber <= partCount).sort((a, b) => a.partNumber - b.partNumber);
}
