import { createAuthClient } from "better-auth/react";
import { env } from "./env";

/**
 * better-auth's browser client (email + password, cookie session), mounted by the API at /api/auth.
 * Its fetch is looked up on each call rather than captured when the module loads (better-auth's
 * default), so it uses the same `fetch` as api-client.ts — including a test's stubbed one.
 */
export const authClient = createAuthClient({
  baseURL: env.apiOrigin,
  fetchOptions: { customFetchImpl: (input, init) => globalThis.fetch(input, init) },
});
