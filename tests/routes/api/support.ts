/** Calls a SvelteKit endpoint handler directly with a signed-in user (no HTTP server needed). */
import type { Role } from '../../../src/lib/roles';

export function fakeUser(roles: Role[] = ['formulator']) {
  return { id: 1, email: 'test@kestrelhollow.example', name: 'Test', active: true, roles, createdAt: new Date() };
}

export function jsonEvent(body: unknown, roles: Role[] | null = ['formulator'], headers: Record<string, string> = {}) {
  const text = typeof body === 'string' ? body : JSON.stringify(body);
  return {
    request: new Request('http://local/api', { method: 'POST', body: text, headers: { 'content-type': 'application/json', ...headers } }),
    locals: { user: roles ? fakeUser(roles) : null, viaToken: false, denied: null }
  };
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function call(handler: (e: any) => Promise<Response> | Response, event: unknown): Promise<{ status: number; body: any }> {
  try {
    const res = await handler(event);
    return { status: res.status, body: await res.json() };
  } catch (err) {
    // SvelteKit's error() throws an HttpError with status and body.
    const e = err as { status?: number; body?: unknown };
    if (typeof e.status === 'number') return { status: e.status, body: e.body };
    throw err;
  }
}
