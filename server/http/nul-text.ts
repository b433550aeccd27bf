import { formatPath } from '../../shared/model/validation-messages';

/** PostgreSQL cannot store U+0000 in text or jsonb; we say so at the door instead of failing in the database. */
export const NUL_MESSAGE = 'must not contain the NUL character (\\u0000)';

/** The path (as users read it, `panels[2].name`) of the first string or object key holding U+0000, if any. */
export function findNulText(value: unknown, path: PropertyKey[] = []): string | undefined {
  if (typeof value === 'string') return value.includes('\u0000') ? formatPath(path) || '(body)' : undefined;
  if (typeof value !== 'object' || value === null) return undefined;
  for (const [key, child] of Object.entries(value)) {
    const at = [...path, Array.isArray(value) ? Number(key) : key];
    if (key.includes('\u0000')) return formatPath(at);
    const found = findNulText(child, at);
    if (found) return found;
  }
  return undefined;
}
