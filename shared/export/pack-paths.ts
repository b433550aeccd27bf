/** Names that Windows refuses as a file or folder, with or without an extension. */
const RESERVED = /^(con|prn|aux|nul|com[1-9]|lpt[1-9])(\..*)?$/i;
const MAX_LENGTH = 80;

/**
 * A name made safe as one segment of a path in the zip: no slash or backslash (so it never opens a
 * folder), no control character, none of the characters Windows forbids, no leading or trailing dots or
 * spaces (so never `.` or `..`), not a name Windows reserves, at most 80 characters. Falls back to
 * `fallback` (made safe the same way) when nothing is left, and to `unnamed` after that.
 */
export function safeSegment(name: string, fallback = 'unnamed'): string {
  const cleaned = [
    ...name
      .normalize('NFC')
      .replace(/[\u0000-\u001f\u007f-\u009f/\\:*?"<>|]/g, '-')
      .replace(/\s+/g, ' ')
      .replace(/-{2,}/g, '-')
      .replace(/^[\s.-]+|[\s.]+$/g, ''),
  ]
    .slice(0, MAX_LENGTH)
    .join('')
    .replace(/[\s.]+$/, '');
  if (cleaned === '') return fallback === 'unnamed' ? fallback : safeSegment(fallback);
  return RESERVED.test(cleaned) ? `_${cleaned}` : cleaned;
}

/**
 * Hands out names that are unique within one folder, comparing without case as Windows and macOS do:
 * the second `Shelf` becomes `Shelf (2)`.
 */
export class UniqueNames {
  private readonly taken = new Set<string>();

  /** The name itself when free, else the name with the first free ` (n)` added. */
  take(name: string): string {
    let candidate = name;
    for (let n = 2; this.taken.has(candidate.toLowerCase()); n++) candidate = `${name} (${n})`;
    this.taken.add(candidate.toLowerCase());
    return candidate;
  }
}
