import { ATTACHMENT_TYPES, type AttachmentType } from '../../shared/api/attachment-contract';
import { AppError } from '../http/app-error';

const isAllowed = (mime: string): mime is AttachmentType => mime in ATTACHMENT_TYPES;

const BY_EXTENSION: Record<string, AttachmentType> = { png: 'image/png', jpg: 'image/jpeg', jpeg: 'image/jpeg', webp: 'image/webp', pdf: 'application/pdf' };
/** The extension a file of each type is saved with. */
const EXTENSION: Record<AttachmentType, string> = { 'image/png': 'png', 'image/jpeg': 'jpg', 'image/webp': 'webp', 'application/pdf': 'pdf' };

/**
 * The name a file of this content type is kept and downloaded under: the name it came with when its
 * extension is one of the type's (in any case), else with its extension replaced by the type's. A PNG
 * sent as `invoice.html` downloads as `invoice.png`, so once saved to disk it opens as a picture,
 * never as a web page.
 */
export function nameForType(fileName: string, type: AttachmentType): string {
  const match = /^(.*[^.])\.([^.]*)$/.exec(fileName);
  if (match && BY_EXTENSION[match[2].toLowerCase()] === type) return fileName;
  return `${match ? match[1] : fileName}.${EXTENSION[type]}`;
}

/** The type the client claims, from the part's Content-Type or else the name's extension, when it is one we take. */
function claimedType(fileName: string, declared: string): AttachmentType | undefined {
  if (isAllowed(declared)) return declared;
  return BY_EXTENSION[/\.([a-z0-9]+)$/i.exec(fileName)?.[1].toLowerCase() ?? ''];
}

const ACCEPTED = 'Attachments may be PNG, JPEG or WebP images or PDF documents, told by their content.';

/**
 * The type of an upload, decided by its content's signature (file-type reads the magic numbers), never
 * by its name or the type the browser sent: a file named `.png` that is not a PNG is refused, saying so.
 */
export async function attachmentType(bytes: Uint8Array, fileName: string, declared: string): Promise<AttachmentType> {
  // file-type and the readers it brings load with the first upload, not at every start.
  const { fileTypeFromBuffer } = await import('file-type');
  const found = await fileTypeFromBuffer(bytes);
  if (found && isAllowed(found.mime)) return found.mime;
  const content = found ? `its content is ${found.ext.toUpperCase()} (${found.mime})` : 'its content is not a kind of file Borewright recognises';
  const claimed = claimedType(fileName, declared);
  // The client shows the file's name before the message, so the message speaks of "this file".
  const message = claimed ? `This file is named or sent as a ${ATTACHMENT_TYPES[claimed]}, but it is not one: ${content}.` : `This file cannot be attached: ${content}.`;
  throw new AppError(415, 'unsupported-file-type', `${message} ${ACCEPTED}`, { fields: { file: found ? `is ${found.mime}` : 'is of an unknown type' } });
}
