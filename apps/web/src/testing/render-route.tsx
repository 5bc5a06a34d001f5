import { QueryClientProvider } from "@tanstack/react-query";
import { render } from "@testing-library/react";
import type { ReactElement } from "react";
import { MemoryRouter, Route, Routes } from "react-router-dom";
import { testQueryClient } from "@/testing/render-with-client";

/**
 * Renders a page at a URL so `useParams` sees its id, on the same real
 * QueryClient as renderWithClient; a catch-all route records where navigation went.
 */
export function renderRoute(ui: ReactElement, { path, url }: { path: string; url: string }) {
  const client = testQueryClient();
  return render(
    <QueryClientProvider client={client}>
      <MemoryRouter initialEntries={[url]}>
        <Routes>
          <Route path={path} element={ui} />
          <Route path="*" element={<p>Left the page</p>} />
        </Routes>
      </MemoryRouter>
    </QueryClientProvider>,
  );
}
