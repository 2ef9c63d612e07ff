import type { User } from '$lib/server/accounts/users';

declare global {
  namespace App {
    interface Error {
      message: string;
      reason?: string;
      /** Set when the request failed because this service is down (the page says so; status 503). */
      outage?: 'database' | 'file storage';
    }
    interface Locals {
      /** The signed-in, active user (session or API token), or null. */
      user: User | null;
      /** Set when the request came with a bearer token. */
      viaToken: boolean;
      /** Set by the guard for page requests the user's roles do not allow. */
      denied: string | null;
      /** Set by handleError when a service went down during the request (answered 503). */
      outage?: 'database' | 'file storage';
    }
  }
}

export {};
