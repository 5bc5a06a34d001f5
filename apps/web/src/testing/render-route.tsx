import { QueryClientProvider } from "@tanstack/react-query";
import { render } from "@testing-library/react";
import type { ReactElement } from "react";
import { createMemoryRouter, RouterProvider } from "react-router-dom";
import { testQueryClient } from "@/testing/render-with-client";

/**
 * Renders a page at a URL so `useParams` sees its id, on the same real
 * QueryClient as renderWithClient; a catch-all route records where navigation went.
 * A data router, as in the app, so pages that hold navigation (useBlocker) work here too.
 */
export function renderRoute(ui: ReactElement, { path, url }: { path: string; url: string }) {
  const client = testQueryClient();
  const router = createMemoryRouter(
    [
      { path, element: ui },
      { path: "*", element: <p>Left the page</p> },
    ],
    { initialEntries: [url] },
  );
  return {
    router,
    ...render(
      <QueryClientProvider client={client}>
        <RouterProvider router={router} />
      </QueryClientProvider>,
    ),
  };
}
