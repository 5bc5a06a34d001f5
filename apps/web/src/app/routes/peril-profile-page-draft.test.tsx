import { screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { draftStorageKey } from "@/lib/draft-storage";
import { formatDateTime } from "@/lib/format";
import { flatRateCurve, perilProfileRecord } from "@/features/peril/testing/records";
import { stubFetch } from "@/testing/fetch-stub";
import { renderRoute } from "@/testing/render-route";
import { PerilProfileEditor } from "./peril-profile-page";

const owner = { userId: "u-actuary", canWrite: true };
const at = { path: "/peril-lens/profiles/:profileId", url: "/peril-lens/profiles/pp-1" };
const key = draftStorageKey("peril-profile", "u-actuary", "pp-1");

function answerProfile() {
  stubFetch((req) => {
    if (req.path === "/api/peril-profiles/pp-1") return { body: perilProfileRecord() };
    if (req.method === "POST" && req.path === "/api/peril-profiles/preview") return { body: flatRateCurve() };
    return undefined;
  });
}

afterEach(() => {
  localStorage.clear();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

// A whole editor redraws on every keystroke: on a busy shared machine a test can pass 5 s of wall time.
describe("peril-profile editor keeps unsaved work", { timeout: 20_000 }, () => {
  it("keeps typed changes across a reload and says where the form started from; discarding brings back the saved profile", async () => {
    answerProfile();
    const first = renderRoute(<PerilProfileEditor viewer={owner} />, at);
    const name = await screen.findByRole("textbox", { name: "Name" });
    await userEvent.type(name, " wet"); // a few keystrokes: each one redraws the whole form
    const kept = JSON.parse(localStorage.getItem(key) ?? "null") as { savedAt: string; value: { name: string } };
    expect(kept.value.name).toBe("Flood, Northmere wet");
    first.unmount(); // the reload

    renderRoute(<PerilProfileEditor viewer={owner} />, at);
    expect(await screen.findByRole("textbox", { name: "Name" })).toHaveValue("Flood, Northmere wet");
    expect(screen.getByText(`Restored unsaved draft from ${formatDateTime(kept.savedAt)}.`)).toBeInTheDocument();
    await userEvent.click(screen.getByRole("button", { name: "Discard it" }));
    expect(screen.getByRole("textbox", { name: "Name" })).toHaveValue("Flood, Northmere");
    expect(screen.queryByText(/Restored unsaved draft/)).toBeNull();
    expect(localStorage.getItem(key)).toBeNull();
  });

  it("drops a kept draft that no longer fits the form and says so, instead of breaking the page", async () => {
    localStorage.setItem(key, JSON.stringify({ savedAt: "2026-12-05T14:03:00.000Z", value: { name: "Old shape", metric: "wind-speed" } }));
    answerProfile();
    renderRoute(<PerilProfileEditor viewer={owner} />, at);
    expect(await screen.findByRole("textbox", { name: "Name" })).toHaveValue("Flood, Northmere");
    expect(
      screen.getByText(/^An unsaved draft from 2026-12-05 14:03 UTC could not be restored: it no longer fits this form/),
    ).toBeInTheDocument();
    expect(localStorage.getItem(key)).toBeNull();
  });

  it("asks before leaving with unsaved changes and stays when told to", async () => {
    answerProfile();
    const { router } = renderRoute(<PerilProfileEditor viewer={owner} />, at);
    await userEvent.type(await screen.findByRole("textbox", { name: "Region" }), " East");
    await userEvent.click(screen.getByRole("link", { name: "Back to the peril lens" }));
    expect(screen.getByRole("alertdialog", { name: "Leave without saving?" })).toBeInTheDocument();
    await userEvent.click(screen.getByRole("button", { name: "Keep editing" }));
    expect(router.state.location.pathname).toBe("/peril-lens/profiles/pp-1");
    expect(screen.getByRole("textbox", { name: "Region" })).toHaveValue("Northmere Coast East");
  });

  it("keeps nothing and asks nothing for a person who may only read", async () => {
    answerProfile();
    const { router } = renderRoute(<PerilProfileEditor viewer={{ userId: "u-manager", canWrite: false }} />, at);
    await screen.findByText(/^Read only:/);
    await userEvent.click(screen.getByRole("link", { name: "Back to the peril lens" }));
    expect(router.state.location.pathname).toBe("/peril-lens");
    expect(localStorage.length).toBe(0);
  });
});
