import { useLayoutEffect, type RefObject } from "react";

const FOCUSABLE =
  'a[href], button:not([disabled]), input:not([disabled]), select:not([disabled]), textarea:not([disabled]), [tabindex]:not([tabindex="-1"])';

/**
 * Makes an open panel behave as a modal for the keyboard and for assistive technology: focus
 * moves to `initial` when it opens, Tab and Shift+Tab cycle inside it, the rest of the page is
 * `inert` (not reachable by Tab, click or screen reader) while it is open, and focus goes back to
 * where it was when it closes. The panel must be a direct child of <body> (render it through a
 * portal) so everything else can be made inert. Used while the panel is mounted: mount = open.
 */
export function useModalFocus(panel: RefObject<HTMLElement | null>, initial: RefObject<HTMLElement | null>) {
  // A layout effect, so focus moves before the browser paints the panel and nothing can be
  // typed into the page behind it in between.
  useLayoutEffect(() => {
    const root = panel.current;
    if (!root) return;
    const previous = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    const madeInert = [...document.body.children].filter(
      (el): el is HTMLElement => el instanceof HTMLElement && el !== root && !el.contains(root) && !el.hasAttribute("inert"),
    );
    // The attribute (not the property) so it shows in the DOM and older engines ignore it harmlessly.
    for (const el of madeInert) el.setAttribute("inert", "");
    (initial.current ?? root).focus();

    const onKeyDown = (e: KeyboardEvent) => {
      if (e.key !== "Tab") return;
      const inside = [...root.querySelectorAll<HTMLElement>(FOCUSABLE)];
      const first = inside[0];
      const last = inside[inside.length - 1];
      if (!first || !last) return;
      const active = document.activeElement;
      if (e.shiftKey && (active === first || !root.contains(active))) {
        e.preventDefault();
        last.focus();
      } else if (!e.shiftKey && (active === last || !root.contains(active))) {
        e.preventDefault();
        first.focus();
      }
    };
    document.addEventListener("keydown", onKeyDown);
    return () => {
      document.removeEventListener("keydown", onKeyDown);
      for (const el of madeInert) el.removeAttribute("inert");
      // The element may have gone with a navigation; focusing a detached node does nothing harmful.
      if (previous?.isConnected) previous.focus();
    };
  }, [panel, initial]);
}
