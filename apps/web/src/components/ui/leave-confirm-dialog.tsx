import { useEffect, useId } from "react";
import type { Blocker } from "react-router-dom";
import { Button } from "./button";

/**
 * Asks before leaving a form with unsaved changes (shown while the router holds the navigation).
 * Three ways out: stay; leave and keep the draft in this browser for later; or discard it and
 * leave. Escape and the backdrop mean "stay", the choice that loses nothing.
 */
export function LeaveConfirmDialog({ blocker, onDiscard }: { blocker: Blocker; onDiscard: () => void }) {
  const titleId = useId();

  useEffect(() => {
    if (blocker.state !== "blocked") return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key === "Escape") blocker.reset();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [blocker]);

  if (blocker.state !== "blocked") return null;
  return (
    <div className="fixed inset-0 z-50 flex items-center justify-center bg-black/40 p-4" onClick={() => blocker.reset()}>
      <div
        role="alertdialog"
        aria-modal="true"
        aria-labelledby={titleId}
        className="w-full max-w-md rounded-lg border border-line bg-surface p-5 shadow-card"
        onClick={(e) => e.stopPropagation()}
      >
        <h2 id={titleId} className="text-base font-semibold text-ink">
          Leave without saving?
        </h2>
        <p className="mt-2 text-sm text-text">
          This form has changes that are not saved. If you leave, they stay as a draft in this browser and come back when you open the form
          again.
        </p>
        <div className="mt-4 flex flex-wrap justify-end gap-2">
          {/* Focus starts on the choice that loses nothing. */}
          <Button variant="primary" autoFocus onClick={() => blocker.reset()}>
            Keep editing
          </Button>
          <Button variant="secondary" onClick={() => blocker.proceed()}>
            Leave, keep the draft
          </Button>
          <Button
            variant="danger"
            onClick={() => {
              onDiscard();
              blocker.proceed();
            }}
          >
            Discard changes and leave
          </Button>
        </div>
      </div>
    </div>
  );
}
