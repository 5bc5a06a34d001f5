import { QueryClient } from "@tanstack/react-query";
import { isApiError } from "./api-error";

/**
 * One QueryClient for the app. Client errors (4xx) are not retried: a 403 or 404 will not
 * change on a second try, and retrying would only delay the explanation on screen.
 */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 15_000,
        refetchOnWindowFocus: false,
        retry: (count, error) => !(isApiError(error) && error.status >= 400 && error.status < 500) && count < 2,
      },
      mutations: { retry: false },
    },
  });
}
