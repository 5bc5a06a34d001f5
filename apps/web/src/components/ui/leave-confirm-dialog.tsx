import { useEffect, useId, useRef } from "react";
import { createPortal } from "react-dom";
import type { Blocker } from "react-router-dom";
import { Button } from "./button";
import { useModalFocus } from "./use-modal-focus";

/**
 * Asks before leaving a form with unsaved changes (shown while the router holds the navigation).
 * Three ways out: stay; leave and keep the draft in this browser for later; or discard it and
 * leave. Escape and the backdrop mean "stay", the choice that loses nothing. While it is open it
 * is modal: focus starts inside, Tab cycles inside, the page behind is inert, and focus returns to
 * where it was when the person stays.
 */
export function LeaveConfirmDialog({ blocker, onDiscard }: { blocker: Blocker; onDiscard: () => void }) {
  if (blocker.state !== "blocked") return null;
  // Rendered only while blocked, so mounting is opening and unmounting is closing.
  return <OpenLeaveConfirmDialog blocker={blocker} onDiscard={onDiscard} />;
}

function OpenLeaveConfirmDialog({ blocker, onDiscard }: { blocker: Extract<Blocker, { state: "blocked" }>; onDiscard: () => void }) {
  const titleId = useId();
  const backdrop = useRef<HTMLDivElement>(null);
  const keepEditing = useRef<HTMLButtonElement>(null);
  useModalFocus(backdrop, keepEditing);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.key === "Escape") blocker.reset();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [blocker]);

  // A portal to <body>, so the rest of the page can be made inert around it.
  return createPortal(
    <div ref={backdrop} className="fixed inset-0 z-50 flex items-center justify-center bg-black/40 p-4" onClick={() => blocker.reset()}>
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
          <Button ref={keepEditing} variant="primary" onClick={() => blocker.reset()}>
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
    </div>,
    document.body,
  );
}
