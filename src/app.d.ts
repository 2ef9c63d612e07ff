import type { User } from '$lib/server/accounts/users';

declare global {
  namespace App {
    interface Error {
      message: string;
      reason?: string;
    }
    interface Locals {
      /** The signed-in, active user (session or API token), or null. */
      user: User | null;
      /** Set when the request came with a bearer token. */
      viaToken: boolean;
      /** Set by the guard for page requests the user's roles do not allow. */
      denied: string | null;
    }
  }
}

export {};
