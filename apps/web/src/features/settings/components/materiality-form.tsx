import { useState } from "react";
import { MATERIALITY_DEFAULTS, updateMaterialityBodySchema, type MaterialitySettings } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { Field, Input, Textarea } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
import { isApiError } from "@/lib/api-error";
import { formatDateTime } from "@/lib/format";
import { useSaveMateriality } from "../api/save-materiality";

type Fields = { medianShiftK: string; exceedancePoints: string; widthChangePercent: string; reason: string };

const asNumber = (text: string) => (text.trim() === "" ? undefined : Number(text));

/**
 * The admin's materiality policy: the three thresholds a minor change must stay under on every
 * pinned pathway, and a reason (audited with the old and new values). Errors sit beside their
 * fields, from the same schema the server uses, and the server's own 400 is placed the same way.
 */
export function MaterialityForm({ settings }: { settings: MaterialitySettings }) {
  const save = useSaveMateriality();
  const start = (s: MaterialitySettings): Fields => ({
    medianShiftK: String(s.policy.medianShiftK),
    exceedancePoints: String(s.policy.exceedancePoints),
    widthChangePercent: String(s.policy.widthChangePercent),
    reason: "",
  });
  const [fields, setFields] = useState<Fields>(() => start(settings));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const set = (key: keyof Fields) => (e: { target: { value: string } }) => setFields((f) => ({ ...f, [key]: e.target.value }));

  function submit() {
    const parsed = updateMaterialityBodySchema.safeParse({
      medianShiftK: asNumber(fields.medianShiftK),
      exceedancePoints: asNumber(fields.exceedancePoints),
      widthChangePercent: asNumber(fields.widthChangePercent),
      reason: fields.reason,
    });
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0] ?? ""), i.message])));
      return;
    }
    setErrors({});
    save.mutate(parsed.data, { onSuccess: (saved) => setFields(start(saved)) });
  }

  const serverErrors = isApiError(save.error) ? save.error.fieldMessages() : {};
  const errorOf = (key: keyof Fields) => errors[key] ?? serverErrors[key];
  return (
    <form
      className="flex max-w-xl flex-col gap-4"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <p className="text-sm text-muted">
        A change filed as <strong>minor</strong> is refused when its preview against the parent passes any of these on any pinned pathway; the author then files it as
        major. Defaults ({MATERIALITY_DEFAULTS.medianShiftK} K, {MATERIALITY_DEFAULTS.exceedancePoints} points, {MATERIALITY_DEFAULTS.widthChangePercent} %) are common
        practice for a first policy, not a published standard: set them with your actuarial function and local regulation.
      </p>
      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="Median shift (K)" error={errorOf("medianShiftK")} hint="Any horizon's median warming">
          {(p) => <Input {...p} inputMode="decimal" value={fields.medianShiftK} onChange={set("medianShiftK")} />}
        </Field>
        <Field label="Exceedance (points)" error={errorOf("exceedancePoints")} hint="Any threshold's probability">
          {(p) => <Input {...p} inputMode="decimal" value={fields.exceedancePoints} onChange={set("exceedancePoints")} />}
        </Field>
        <Field label="5–95 % width (%)" error={errorOf("widthChangePercent")} hint="Relative to the parent's width">
          {(p) => <Input {...p} inputMode="decimal" value={fields.widthChangePercent} onChange={set("widthChangePercent")} />}
        </Field>
      </div>
      <Field label="Reason for the change" error={errorOf("reason")} hint="Kept in the audit log with the old and new values.">
        {(p) => <Textarea {...p} rows={2} maxLength={500} value={fields.reason} onChange={set("reason")} />}
      </Field>
      {save.error && !isApiError(save.error) && <ErrorState error={save.error} />}
      {isApiError(save.error) && save.error.status !== 400 && <ErrorState error={save.error} />}
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={save.isPending}>
          {save.isPending ? "Saving…" : "Save thresholds"}
        </Button>
        {save.isSuccess && (
          <span role="status" className="text-sm text-ok">
            Saved; the change is in the audit log.
          </span>
        )}
      </div>
      <p className="text-xs text-muted">
        {settings.customised ? `Last set by ${settings.updatedByName ?? "an admin"} on ${formatDateTime(settings.updatedAt)}.` : "No admin has set the policy yet: the defaults apply."}
      </p>
    </form>
  );
}
