import type { IncomingMessage, ServerResponse } from 'node:http';

import { ApiError } from './api-error.js';

// The hosted service's default payload limit.
const BODY_LIMIT_BYTES = 100 * 1024 * 1024;

export async function readBody(req: IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    size += (chunk as Buffer).length;
    if (size > BODY_LIMIT_BYTES) throw new ApiError('payload_too_large', `The body is larger than ${BODY_LIMIT_BYTES} bytes.`);
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks).toString('utf8');
}

/** Parses a JSON body, or newline-delimited JSON for documents; an empty body is `undefined`. */
export function parseBody(text: string, options: { contentType: string; documents: boolean }): unknown {
  if (text.trim() === '') return undefined;
  const code = options.documents ? 'malformed_payload' : 'bad_request';
  try {
    if (options.documents && options.contentType.startsWith('application/x-ndjson')) {
      return text.split('\n').filter((line) => line.trim() !== '').map((line) => JSON.parse(line) as unknown);
    }
    return JSON.parse(text) as unknown;
  } catch (error) {
    throw new ApiError(code, `The body is not valid JSON: ${(error as Error).message}.`);
  }
}

/** Every answer is JSON (or empty): the SDK parses any body it gets as JSON. */
export function sendJson(res: ServerResponse, status: number, body: unknown): void {
  const text = body === undefined ? '' : JSON.stringify(body);
  res.writeHead(status, {
    'Content-Type': 'application/json',
    'Content-Length': Buffer.byteLength(text),
  });
  res.end(text);
}
