import { useCallback, useMemo, useState, type ComponentProps } from "react";
import type { CreateModelVersionBody } from "@plumeline/contracts";
import { LeaveConfirmDialog } from "@/components/ui/leave-confirm-dialog";
import { RestoredDraftNotice } from "@/components/ui/restored-draft-notice";
import { canonicalJson } from "@/lib/draft-storage";
import { useKeepDraft, useStoredDraft } from "@/lib/use-stored-draft";
import { useUnsavedChangesGuard } from "@/lib/use-unsaved-changes-guard";
import { loadedForm, startFromStored, storedModelFormSchema, storedPart, type StoredModelForm } from "../lib/model-draft-storage";
import type { ModelDraftForm } from "../lib/model-draft-form";
import { ModelEditor } from "./model-editor";

type EditorProps = Omit<ComponentProps<typeof ModelEditor>, "onSave" | "startingForm" | "onFormChange">;

/**
 * The model editor that does not lose work: unsaved changes are kept in this browser under
 * `draftKey` (restored on the next visit, with a notice and a way to discard them), and leaving
 * the page with unsaved changes asks first. `onSave` gets `saved`, to call once the server has
 * the version and before navigating away: it clears the kept draft and lets that navigation through.
 */
export function ModelEditorWithDraft({
  draftKey,
  onSave,
  ...editor
}: EditorProps & { draftKey: string | null; onSave: (body: CreateModelVersionBody, saved: () => void) => void }) {
  const loaded = useMemo(() => loadedForm(editor.initial), [editor.initial]);
  const kept = useStoredDraft(draftKey, storedModelFormSchema);
  // The editor's starting point is fixed per mount; `generation` remounts it after a discard.
  const [generation, setGeneration] = useState(0);
  const [start] = useState(() => (kept.found.status === "restored" ? startFromStored(editor.initial, kept.found.value) : null));
  const fromStore = generation === 0 ? start : null;

  const [current, setCurrent] = useState<StoredModelForm>(() => (start ? storedPart(start.form) : loaded));
  const dirty = canonicalJson(current) !== canonicalJson(loaded);
  useKeepDraft(draftKey, current, dirty);
  const guard = useUnsavedChangesGuard(dirty);

  const onFormChange = useCallback((form: ModelDraftForm) => setCurrent(storedPart(form)), []);
  const { clear } = kept;
  const discard = useCallback(() => {
    clear();
    setCurrent(loaded);
    setGeneration((g) => g + 1);
  }, [clear, loaded]);

  return (
    <>
      <RestoredDraftNotice found={kept.found} onDiscard={discard} onDismiss={kept.dismiss} />
      {fromStore && fromStore.resetInputs.length > 0 && kept.found.status === "restored" && (
        <p className="-mt-2 mb-4 text-xs text-muted">
          Half-typed values were not kept for: {fromStore.resetInputs.join(", ")}; they show the saved values.
        </p>
      )}
      <ModelEditor
        key={generation}
        {...editor}
        initial={fromStore?.seed ?? editor.initial}
        startingForm={fromStore?.form}
        onFormChange={onFormChange}
        onSave={(body) =>
          onSave(body, () => {
            guard.allowNextNavigation();
            clear();
          })
        }
      />
      <LeaveConfirmDialog blocker={guard.blocker} onDiscard={clear} />
    </>
  );
}
