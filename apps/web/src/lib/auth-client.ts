import { createAuthClient } from "better-auth/react";
import { env } from "./env";

/** better-auth's browser client (email + password, cookie session), mounted by the API at /api/auth. */
export const authClient = createAuthClient({ baseURL: env.apiOrigin });
