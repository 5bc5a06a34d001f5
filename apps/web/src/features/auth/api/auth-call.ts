import { ApiError } from "@/lib/api-error";

/**
 * Runs one better-auth client call. The client returns refusals as `{ error }` but throws when
 * the server cannot be reached; that becomes the same network_error api-client.ts gives.
 */
export async function authCall<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (e) {
    if (e instanceof ApiError) throw e;
    throw new ApiError(0, "network_error", "The server could not be reached. Check your connection and try again.");
  }
}
