/**
 * Sign-in through @auth/sveltekit: e-mail + password (Credentials provider, JWT sessions).
 * Throttling and every attempt are recorded in MariaDB; the guard in hooks.server.ts re-reads
 * the user on each request, so deactivation and role changes take effect at once.
 */
import { SvelteKitAuth, CredentialsSignin } from '@auth/sveltekit';
import Credentials from '@auth/sveltekit/providers/credentials';
import { getRequestEvent } from '$app/server';
import { z } from 'zod';
import { checkSignIn } from '$lib/server/auth/sign-in';

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

export const { handle, signIn, signOut } = SvelteKitAuth({
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
        return { id: String(user.id), email: user.email, name: user.name };
      }
    })
  ],
  callbacks: {
    jwt({ token, user }) {
      if (user?.id) token.uid = user.id;
      return token;
    },
    session({ session, token }) {
      if (typeof token.uid === 'string') session.user.id = token.uid;
      return session;
    }
  }
});
