// Sends one fuzz case to the running app and says what, if anything, was wrong with the answer.
import type { Server } from 'node:http';
import request from 'supertest';
import type { FuzzBody } from './fuzz-bodies';
import { toJsonText } from './fuzz-values';

export interface FuzzCase {
  method: string;
  /** Path with its parameters filled, and the query string. */
  url: string;
  body: FuzzBody;
  cookie: string | null;
}

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

function preview(body: FuzzBody): string {
  if (body.kind === 'none') return '(no body)';
  const text = body.kind === 'json' ? JSON.stringify(body.value) : String(body.data);
  const type =
    body.kind === 'raw'
      ? `[Content-Type: ${body.contentType}] `
      : body.kind === 'file'
        ? `[file "${body.fileName}" in field "${body.field}"] `
        : '';
  const encoding = body.kind === 'raw' && body.encoding ? `[Content-Encoding: ${body.encoding}] ` : '';
  return `${type}${encoding}${JSON.stringify(text.slice(0, 500))}${text.length > 500 ? `… (${text.length} chars)` : ''}`;
}

/** What is wrong with a 4xx body, or null when it is {"error":{"code","message","issues"?}}. */
export function errorShapeProblem(body: unknown): string | null {
  const error = (body as { error?: unknown } | null)?.error as Record<string, unknown> | undefined;
  if (typeof error !== 'object' || error === null) return 'no "error" object';
  if (typeof error.code !== 'string' || !/^[A-Z_]+$/.test(error.code)) return 'no error code';
  if (typeof error.message !== 'string' || error.message.trim() === '') return 'empty message';
  if (error.issues !== undefined) {
    const ok =
      Array.isArray(error.issues) &&
      error.issues.every(
        (i: unknown) =>
          typeof (i as { path?: unknown }).path === 'string' &&
          typeof (i as { message?: unknown }).message === 'string',
      );
    if (!ok) return 'issues not a list of {path, message}';
  }
  return null;
}

/**
 * Sends the case and checks the answer: any status below 500, and every 4xx in the error shape.
 *
 * @returns null when the answer is fine, else one line naming the request and what came back
 */
export async function sendCase(server: Server, c: FuzzCase): Promise<string | null> {
  let test = request(server)[c.method.toLowerCase() as Method](c.url).timeout(20_000);
  if (c.cookie) test = test.set('Cookie', c.cookie);
  if (c.body.kind === 'json') test = test.set('Content-Type', 'application/json').send(toJsonText(c.body.value));
  if (c.body.kind === 'file') test = test.attach(c.body.field, Buffer.from(c.body.data), c.body.fileName);
  if (c.body.kind === 'raw') {
    test = test.set('Content-Type', c.body.contentType);
    if (c.body.encoding) test = test.set('Content-Encoding', c.body.encoding);
    test = test.send(c.body.data);
  }
  const cookie = c.cookie ? ` [Cookie: ${c.cookie.slice(0, 48)}]` : '';
  const what = `${c.method} ${c.url.slice(0, 160)}${cookie} ${preview(c.body)}`;
  let res: request.Response;
  try {
    res = await test;
  } catch (error) {
    return `no answer (${(error as Error).message}) to ${what}`;
  }
  if (res.status >= 500) return `${res.status} ${String(res.body?.error?.code)} for ${what}`;
  if (res.status >= 400) {
    const problem = errorShapeProblem(res.body);
    if (problem) return `${res.status} with ${problem} (${res.text.slice(0, 120)}) for ${what}`;
  }
  return null;
}
