/**
 * A new id for a carcass or panel made through the API (the document's ids are the user's; the API
 * picks readable ones): `prefix-1`, `prefix-2`, … the first one not taken.
 */
export function nextDocumentId(prefix: string, taken: ReadonlySet<string>): string {
  for (let n = taken.size + 1; ; n++) {
    const id = `${prefix}-${n}`;
    if (!taken.has(id)) return id;
  }
}
