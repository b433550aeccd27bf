import type { Response, Test } from 'supertest';

/** The kind of parser supertest runs on Node: it reads the response stream itself. */
type Parser = Extract<Parameters<Test['parse']>[0], (res: never, done: never) => void>;

/** A supertest parser that keeps a download's bytes as they came: `.buffer(true).parse(binaryBody)`. */
export const binaryBody: Parser = (res, done) => {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
  res.on('error', (err: Error) => done(err, Buffer.alloc(0)));
};

/** The file name a Content-Disposition header offers. */
export function attachmentName(res: Response): string | undefined {
  const header = String(res.headers['content-disposition'] ?? '');
  const encoded = /filename\*=UTF-8''([^;]+)/.exec(header)?.[1];
  return encoded ? decodeURIComponent(encoded) : /filename="([^"]*)"/.exec(header)?.[1];
}
