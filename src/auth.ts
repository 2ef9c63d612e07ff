/**
 * Sign-in through @auth/sveltekit: e-mail + password (Credentials provider, JWT sessions).
 * Throttling and every attempt are recorded in MariaDB; the guard in hooks.server.ts re-reads
 * the user on each request, so deactivation and role changes take effect at once.
 */
import { SvelteKitAuth, CredentialsSignin, type SvelteKitAuthConfig } from '@auth/sveltekit';
import Credentials from '@auth/sveltekit/providers/credentials';
import { getRequestEvent } from '$app/server';
import { z } from 'zod';
import { checkSignIn } from '$lib/server/auth/sign-in';
import { authForwardedHeaders, useSecureCookies } from '$lib/server/auth/public-origin';
import { config } from '$lib/server/config';
import { safeRedirect } from '$lib/server/auth/safe-redirect';
import { sessionCurrent, sessionEpochOf } from '$lib/server/auth/session-epoch';

const credentialsSchema = z.object({
  email: z.string().trim().toLowerCase().max(254).pipe(z.email()),
  password: z.string().min(1).max(200)
});

class GenericSignInError extends CredentialsSignin {
  code = 'credentials';
}

/**
 * The client address for the audit trail, as the adapter sees it: the socket's peer, or behind a
 * reverse proxy the header named by ADDRESS_HEADER/XFF_DEPTH (adapter-node). A raw X-Forwarded-For
 * is not trusted, since any client can send one.
 */
function clientIp(): string | null {
  try {
    return getRequestEvent().getClientAddress() || null;
  } catch {
    return null;
  }
}

const authConfig: SvelteKitAuthConfig = {
  // The host Auth.js reads is the app's own origin unless TRUST_PROXY_HOST=1 (see hooks.server.ts).
  trustHost: true,
  logger: {
    // A wrong password is routine (it is recorded and audited); everything else is logged.
    error(err) {
      if (!(err instanceof CredentialsSignin)) console.error('[auth]', err.name, err.message);
    },
    warn() {},
    debug() {}
  },
  session: { strategy: 'jwt', maxAge: 12 * 60 * 60 },
  pages: { signIn: '/signin', error: '/signin' },
  providers: [
    Credentials({
      credentials: { email: { label: 'E-mail' }, password: { label: 'Password', type: 'password' } },
      authorize: async (raw) => {
        const parsed = credentialsSchema.safeParse(raw);
        if (!parsed.success) throw new GenericSignInError();
        const { email, password } = parsed.data;
        const user = await checkSignIn(email, password, clientIp());
        if (!user) throw new GenericSignInError();
        return { id: String(user.id), email: user.email, name: user.name, epoch: (await sessionEpochOf(user.id)) ?? 0 };
      }
    })
  ],
  callbacks: {
    // Only paths on this site are followed after sign-in and sign-out, whatever the form said.
    redirect({ url, baseUrl }) {
      const relative = url.startsWith(baseUrl + '/') ? url.slice(baseUrl.length) : url;
      return baseUrl + safeRedirect(relative, baseUrl);
    },
    // A session carries the session epoch it began in; one from an older epoch (signed out,
    // deactivated, roles changed) is void: Auth.js then drops the cookie and answers signed-out.
    async jwt({ token, user }) {
      if (user?.id) {
        token.uid = user.id;
        token.epoch = (user as { epoch?: number }).epoch ?? 0;
        return token;
      }
      if (typeof token.uid !== 'string') return token;
      return (await sessionCurrent(Number(token.uid), Number(token.epoch ?? 0))) ? token : null;
    },
    session({ session, token }) {
      if (typeof token.uid === 'string') session.user.id = token.uid;
      return session;
    }
  }
};

export const { handle, signIn, signOut } = SvelteKitAuth(async (event) => ({
  ...authConfig,
  useSecureCookies: useSecureCookies(authForwardedHeaders(event.url, event.request.headers, config().trustProxyHost).proto)
}));
