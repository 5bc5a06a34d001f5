import { z } from "zod";

/**
 * `:id` in a path: any non-empty string. Unknown ids are the service's to answer (404 naming
 * the thing), so the route checks only that one was given.
 */
export const idParams = z.object({ id: z.string().min(1) });
