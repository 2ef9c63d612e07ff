import { sequence } from '@sveltejs/kit/hooks';
import { error, json, redirect, type Handle, type HandleServerError, type ServerInit } from '@sveltejs/kit';
import { handle as authHandle } from './auth';
import { decide } from '$lib/access/route-table';
import * as users from '$lib/server/accounts/users';
import { userForToken } from '$lib/server/auth/tokens';
import { closeDb } from '$lib/server/db/index';
import { answerOutages, logOutage, noteOutage, OUTAGE_MESSAGE, outageOf, RETRY_AFTER } from '$lib/server/http/outage';
import { securityHeaders } from '$lib/server/security-headers';
import { errorBody } from '$lib/server/http/status';
import { authForwardedHeaders } from '$lib/server/auth/public-origin';
import { config } from '$lib/server/config';

/** Who is asking: a bearer token on /api, else the Auth.js session. Inactive users count as signed out. */
async function identify(event: Parameters<Handle>[0]['event']): Promise<Response | null> {
  event.locals.user = null;
  event.locals.viaToken = false;
  event.locals.denied = null;
  const authz = event.request.headers.get('authorization');
  if (event.url.pathname.startsWith('/api/') && authz?.toLowerCase().startsWith('bearer ')) {
    const user = await userForToken(authz.slice(7).trim());
    if (!user) return json({ error: 'The API token is unknown, expired or revoked, or its user is deactivated.' }, { status: 401 });
    event.locals.user = user;
    event.locals.viaToken = true;
    return null;
  }
  const session = await event.locals.auth();
  const id = Number(session?.user?.id);
  if (Number.isInteger(id) && id > 0) {
    const user = await users.get(id);
    event.locals.user = user?.active ? user : null;
  }
  return null;
}

const guard: Handle = async ({ event, resolve }) => {
  const isApi = event.url.pathname.startsWith('/api/');
  if (event.route.id === '/api/health') return resolve(event);
  try {
    const early = await identify(event);
    if (early) return early;
  } catch (err) {
    const outage = outageOf(err);
    if (outage) {
      logOutage(outage, err, 'sign-in check');
      if (isApi) return json(errorBody(OUTAGE_MESSAGE[outage]), { status: 503, headers: RETRY_AFTER });
      error(503, { message: OUTAGE_MESSAGE[outage], outage });
    }
    throw err;
  }
  const user = event.locals.user;
  const decision = decide(event.route.id, event.request.method, user?.roles ?? null);
  if (decision === 'allow') return resolve(event);
  if (decision === 'signin') {
    if (isApi) return json({ error: 'Sign-in or an API token is required.' }, { status: 401 });
    const back = event.url.pathname + event.url.search;
    redirect(303, `/signin?redirectTo=${encodeURIComponent(back)}`);
  }
  const reason =
    decision === 'unlisted'
      ? 'This address is not open to any role.'
      : `Your roles (${user?.roles.join(', ') || 'none'}) do not include access to this page or action.`;
  if (isApi) return json(errorBody(`Forbidden: ${reason}`), { status: 403 });
  if (event.request.method === 'GET' && !event.isDataRequest) {
    event.locals.denied = reason;
    return resolve(event);
  }
  error(403, { message: 'Forbidden', reason });
};

const headers: Handle = async ({ event, resolve }) => {
  let response = await resolve(event);
  try {
    response.headers.set('x-frame-options', 'DENY');
  } catch {
    // Response.redirect() (used by Auth.js) has immutable headers: copy into a mutable response.
    response = new Response(response.body, {
      status: response.status,
      statusText: response.statusText,
      headers: new Headers(response.headers)
    });
  }
  for (const [k, v] of Object.entries(securityHeaders(event.url.pathname))) {
    if (!response.headers.has(k)) response.headers.set(k, v);
  }
  return response;
};

/**
 * Auth.js builds its redirects from X-Forwarded-Host/-Proto (else Host). Unless a trusted proxy
 * sets them (TRUST_PROXY_HOST=1), they are overwritten with the app's own origin before it runs.
 */
const publicOrigin: Handle = async ({ event, resolve }) => {
  const { host, proto } = authForwardedHeaders(event.url, event.request.headers, config().trustProxyHost);
  try {
    event.request.headers.set('x-forwarded-host', host);
    event.request.headers.set('x-forwarded-proto', proto);
  } catch {
    const copy = new Headers(event.request.headers);
    copy.set('x-forwarded-host', host);
    copy.set('x-forwarded-proto', proto);
    event.request = new Request(event.request, { headers: copy });
  }
  return resolve(event);
};

export const handle = sequence(answerOutages, headers, publicOrigin, authHandle, guard);

export const handleError: HandleServerError = ({ error: err, status, event }) => {
  const outage = noteOutage(err, event);
  if (outage) return outage;
  // A missing page is not a fault of ours: say it is missing, and log only real errors.
  if (status === 404) return { message: 'There is no page at this address.' };
  console.error('[phosforge] unexpected error', err instanceof Error ? err.stack : err);
  return { message: 'Something went wrong on our side. The error has been logged.' };
};

/** Loads the blend solver (and mathjs behind it) before the first request, not during it. */
export const init: ServerInit = async () => {
  await import('$lib/blend');
  const { warmSolverPool, closeSolverPool } = await import('$lib/server/solver/pool');
  warmSolverPool();
  process.once('sveltekit:shutdown', () => void closeSolverPool());
  const { closeReadPool } = await import('$lib/server/measurements/read-pool');
  process.once('sveltekit:shutdown', () => void closeReadPool());
  // adapter-node stops accepting requests on SIGINT/SIGTERM, then emits this: close the database
  // pool so idle connections do not keep the process alive.
  process.once('sveltekit:shutdown', () => void closeDb());
};
