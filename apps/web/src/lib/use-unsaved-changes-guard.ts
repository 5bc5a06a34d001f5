import { useCallback, useEffect, useRef } from "react";
import { useBlocker, type Blocker, type Location } from "react-router-dom";

const sameAddress = (a: Location, b: Location) => a.pathname === b.pathname && a.search === b.search;

/**
 * While `dirty`, leaving the page asks first: in-app navigation is held by React Router's blocker
 * (the caller shows `LeaveConfirmDialog` for it), and closing or reloading the tab gets the
 * browser's own "leave site?" prompt. `allowNextNavigation` lets the navigation that follows a
 * successful save through without asking: the save's `onSuccess` runs before React re-renders
 * with the form no longer dirty, so the blocker reads refs rather than the rendered value.
 */
export function useUnsavedChangesGuard(dirty: boolean): { blocker: Blocker; allowNextNavigation: () => void } {
  const dirtyRef = useRef(dirty);
  const allowRef = useRef(false);
  useEffect(() => {
    dirtyRef.current = dirty;
    if (!dirty) allowRef.current = false;
  }, [dirty]);

  const blocker = useBlocker(
    useCallback(({ currentLocation, nextLocation }: { currentLocation: Location; nextLocation: Location }) => {
      if (sameAddress(currentLocation, nextLocation)) return false;
      if (allowRef.current) {
        allowRef.current = false;
        return false;
      }
      return dirtyRef.current;
    }, []),
  );

  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => {
      if (allowRef.current) return;
      // Browsers show their own fixed wording; preventDefault is what asks for it.
      e.preventDefault();
    };
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [dirty]);

  const allowNextNavigation = useCallback(() => {
    allowRef.current = true;
  }, []);

  return { blocker, allowNextNavigation };
}
