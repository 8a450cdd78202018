import type { Test } from 'supertest';

type Parser = Parameters<Test['parse']>[0];

function collect(res: NodeJS.ReadableStream, done: (err: Error | null, body?: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
  res.on('error', (err: Error) => done(err));
}

/** A supertest body parser that keeps a binary reply (a zip) as one Buffer: `.buffer(true).parse(binaryBody)`. */
export const binaryBody = collect as unknown as Parser;
