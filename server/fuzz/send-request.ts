import type { Express } from 'express';
import supertest from 'supertest';
import { HOST, ORIGIN } from '../../tests/helpers/test-server.js';
import type { BadRequest } from './bad-requests.js';

/** Lucia's cookie name (server/features/auth/lucia.ts). */
const SESSION_COOKIE = 'ringseat_session';

/** Someone sending requests: nobody, or a person signed in once whose session cookie is reused. */
export type Sender = { who: string; sessionCookie: string | null };

export type Answer = { status: number; type: string; text: string };

/**
 * Sends `request` as a browser on the app's page would (Host and Origin, which the request may
 * override), with the sender's session cookie after the request's own odd cookies. No cookie
 * jar is involved: an agent's jar would rewrite the odd cookies before they left, and a forged
 * session cookie's blank answer would sign the agent out for every request after.
 */
export async function send(app: Express, sender: Sender, request: BadRequest): Promise<Answer> {
  const headers: Record<string, string> = { host: HOST, origin: ORIGIN, ...request.headers };
  const cookie = cookieFor(sender, request.headers.cookie);
  if (cookie === undefined) delete headers.cookie;
  else headers.cookie = cookie;
  const test = start(supertest(app), request)
    .ok(() => true)
    .timeout(15_000);
  for (const [name, value] of Object.entries(headers)) test.set(name, value);
  try {
    const res = await (request.body.text === undefined ? test : test.send(request.body.text));
    const text = typeof res.text === 'string' ? res.text : '';
    return { status: res.status, type: String(res.headers['content-type'] ?? ''), text };
  } catch (error) {
    return { status: 0, type: 'no answer', text: String(error) };
  }
}

function cookieFor(sender: Sender, odd: string | undefined): string | undefined {
  if (!sender.sessionCookie) return odd;
  const others = odd === undefined ? '' : withoutSessionCookie(odd);
  return others.trim() === '' ? sender.sessionCookie : `${others}; ${sender.sessionCookie}`;
}

function start(client: ReturnType<typeof supertest>, { method, path }: BadRequest) {
  switch (method) {
    case 'GET':
      return client.get(path);
    case 'POST':
      return client.post(path);
    case 'PUT':
      return client.put(path);
    case 'PATCH':
      return client.patch(path);
    case 'DELETE':
      return client.delete(path);
  }
}

const withoutSessionCookie = (cookie: string) =>
  cookie
    .split(';')
    .filter((part) => part.split('=')[0].trim() !== SESSION_COOKIE)
    .join(';');

const clip = (text: string, max: number) =>
  text.length > max ? `${text.slice(0, max)}… (${text.length} characters)` : text;

/** The request and its answer, in words a person can replay with curl. */
export function describeExchange(
  sender: Sender,
  request: BadRequest,
  answer: Answer,
  serverErrors: string[],
): string {
  const headers = Object.entries(request.headers)
    .map(([name, value]) => `    ${name}: ${clip(JSON.stringify(value), 300)}`)
    .join('\n');
  return [
    `${request.method} ${clip(request.path, 500)} as ${sender.who}`,
    `  headers:\n${headers || '    (only the Host and Origin of the app page)'}`,
    `  body: ${request.body.text === undefined ? '(none)' : clip(JSON.stringify(request.body.text), 800)}`,
    `  answer: ${answer.status} ${answer.type} ${clip(answer.text, 500)}`,
    ...(serverErrors.length > 0 ? [`  server log:\n${serverErrors.join('\n')}`] : []),
  ].join('\n');
}
