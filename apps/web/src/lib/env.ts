import { formatIssues } from "@plumeline/contracts";
import { z } from "zod";

/**
 * Build-time environment, parsed once at start-up (bulletproof-react habit): a bad value
 * fails loudly here instead of somewhere deep in a request.
 */
const envSchema = z.object({
  /** Where the API lives; empty means the same origin as the page (production: one port). */
  VITE_API_ORIGIN: z.url().optional().or(z.literal("")),
  /** How often live run progress is polled, in milliseconds. */
  VITE_POLL_MS: z.coerce.number().int().min(250).default(1500),
});

const parsed = envSchema.safeParse(import.meta.env);
if (!parsed.success) {
  throw new Error(`Invalid web environment: ${formatIssues(parsed.error).join("; ")}`);
}

export const env = {
  apiOrigin: parsed.data.VITE_API_ORIGIN || (typeof window !== "undefined" ? window.location.origin : "http://localhost"),
  pollMs: parsed.data.VITE_POLL_MS,
};
