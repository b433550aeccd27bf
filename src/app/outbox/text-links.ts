/** A piece of a mail's text: words as they are, or an address to open. */
export interface TextPart {
  value: string;
  link: boolean;
}

// An http(s) address up to the next space or angle bracket; a full stop, comma or bracket closing a
// sentence stays outside it.
const ADDRESS = /https?:\/\/[^\s<>"]+[^\s<>".,;:!?)\]]/g;

/** Splits a plain-text mail into words and http(s) links, so that the Outbox can make the links clickable. */
export function textParts(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let from = 0;
  for (const match of text.matchAll(ADDRESS)) {
    if (match.index > from) parts.push({ value: text.slice(from, match.index), link: false });
    parts.push({ value: match[0], link: true });
    from = match.index + match[0].length;
  }
  if (from < text.length) parts.push({ value: text.slice(from), link: false });
  return parts;
}
