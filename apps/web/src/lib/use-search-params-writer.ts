import { useCallback, useRef } from "react";
import { useNavigate, useSearchParams } from "react-router-dom";

/**
 * The URL's search params and a writer that builds each change on the last one written.
 * Why: React Router renders a navigation later (in a transition) and hands a functional
 * update the params of the render before it, so a second change made before that render (a
 * search, then at once a sort; a run chosen, then at once a pathway) would write the first
 * one back out. The writer's base follows the URL whenever the URL changes (a navigation
 * committed, Back).
 */
export function useSearchParamsWriter() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const latest = useRef({ seen: params.toString(), params });
  if (params.toString() !== latest.current.seen) latest.current = { seen: params.toString(), params };
  const write = useCallback(
    // The change may give the search as text, to keep it as written (e.g. commas unescaped).
    (change: (prev: URLSearchParams) => URLSearchParams | string, options?: { replace: boolean }) => {
      const next = change(new URLSearchParams(latest.current.params)).toString();
      latest.current = { ...latest.current, params: new URLSearchParams(next) };
      void navigate({ search: `?${next}` }, options);
    },
    [navigate],
  );
  return [params, write] as const;
}
