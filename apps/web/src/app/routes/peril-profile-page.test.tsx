import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { apiError, flatRateCurve, perilProfileRecord } from "@/features/peril/testing/records";
import { renderRoute } from "@/testing/render-route";
import { PerilProfileEditor } from "./peril-profile-page";

afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

const owner = { userId: "u-actuary", canWrite: true };
const at = (id: string) => ({ path: "/peril-lens/profiles/:profileId", url: `/peril-lens/profiles/${id}` });
const preview = (req: { method: string; path: string }) => (req.method === "POST" && req.path === "/api/peril-profiles/preview" ? { body: flatRateCurve() } : undefined);

describe("PerilProfileEditor states", () => {
  it("shows an unknown id as a missing profile with the way back, not as a failure", async () => {
    stubFetch((req) => (req.path === "/api/peril-profiles/pp-gone" ? apiError(404, "not_found", "Peril profile pp-gone does not exist.") : undefined));
    renderRoute(<PerilProfileEditor viewer={owner} />, at("pp-gone"));
    expect(screen.getByText("Loading profile…")).toBeInTheDocument();
    expect(await screen.findByRole("heading", { name: "No peril profile here" })).toBeInTheDocument();
    expect(screen.getByText("There is no peril profile at this address")).toBeInTheDocument();
    expect(screen.getByRole("link", { name: "Back to the peril lens" })).toHaveAttribute("href", "/peril-lens");
    expect(screen.queryByRole("alert")).toBeNull();
  });

  it("keeps the server's reason and a retry when the profile cannot be read for another reason", async () => {
    stubFetch(() => apiError(500, "internal_error", "An unexpected error occurred."));
    renderRoute(<PerilProfileEditor viewer={owner} />, at("pp-1"));
    expect(await screen.findByRole("heading", { name: "The peril profile could not be loaded" })).toBeInTheDocument();
    expect(screen.getByRole("alert")).toHaveTextContent("An unexpected error occurred.");
    expect(within(screen.getByRole("alert")).getByRole("button", { name: "Try again" })).toBeInTheDocument();
  });

  it("says why the form is read-only for a role that may only read", async () => {
    stubFetch((req) => (req.path === "/api/peril-profiles/pp-1" ? { body: perilProfileRecord() } : preview(req)));
    renderRoute(<PerilProfileEditor viewer={{ userId: "u-manager", canWrite: false }} />, at("pp-1"));
    // docs/API.md permission table: perils:write is held by the analyst and actuary roles.
    const note = await screen.findByText(/^Read only:/);
    expect(note).toHaveRole("status");
    expect(note).toHaveTextContent("Read only: your role can view peril profiles; only the analyst or actuary role can write or change them.");
    expect(screen.queryByRole("button", { name: "Save changes" })).toBeNull();
  });

  it("explains a save refused because the profile was locked meanwhile, and turns the form read-only", async () => {
    const message = 'Peril profile "Flood, Northmere" is locked (used by 1 run) and cannot be changed. Copy it instead.';
    let locked = false;
    stubFetch((req) => {
      if (req.path === "/api/peril-profiles/pp-1" && req.method === "PATCH") {
        locked = true; // a run took the profile between opening the page and saving
        return apiError(409, "peril_profile_locked", message);
      }
      if (req.path === "/api/peril-profiles/pp-1") return { body: perilProfileRecord(locked ? { locked: true, lockedBy: { modelVersions: [], runIds: ["r-9"] } } : {}) };
      return preview(req);
    });
    renderRoute(<PerilProfileEditor viewer={owner} />, at("pp-1"));
    await userEvent.click(await screen.findByRole("button", { name: "Save changes" }));

    const alert = await screen.findByRole("alert");
    expect(within(alert).getByText("This profile is locked")).toBeInTheDocument();
    expect(alert).toHaveTextContent(message);
    // The record is read again, so the lock note replaces the save button.
    expect(await screen.findByText(/Locked: used by 1 run\./)).toBeInTheDocument();
    expect(screen.queryByRole("button", { name: "Save changes" })).toBeNull();
    expect(screen.getByRole("alert")).toHaveTextContent("This profile is locked");
  });

  it("explains a delete refused because a draft model version still names the profile, and stays on the page", async () => {
    const message = 'Peril profile "Flood, Northmere" is named by model version "Coastal" v3 (draft); remove it there first.';
    vi.spyOn(window, "confirm").mockReturnValue(true);
    stubFetch((req) => {
      if (req.path === "/api/peril-profiles/pp-1" && req.method === "DELETE") return apiError(409, "peril_profile_in_use", message);
      if (req.path === "/api/peril-profiles/pp-1") return { body: perilProfileRecord() };
      return preview(req);
    });
    renderRoute(<PerilProfileEditor viewer={owner} />, at("pp-1"));
    await userEvent.click(await screen.findByRole("button", { name: "Delete" }));
    const alert = await screen.findByRole("alert");
    expect(within(alert).getByText("A draft model version still names this profile")).toBeInTheDocument();
    expect(alert).toHaveTextContent(message);
    expect(screen.queryByText("Left the page")).toBeNull();
  });

  it("names a 403 from the server as the creator-only rule, with the server's sentence", async () => {
    const message = "Only the person who created a peril profile can edit it; copy it to make your own.";
    stubFetch((req) => {
      if (req.path === "/api/peril-profiles/pp-1" && req.method === "PATCH") return apiError(403, "not_owner", message);
      if (req.path === "/api/peril-profiles/pp-1") return { body: perilProfileRecord() };
      return preview(req);
    });
    renderRoute(<PerilProfileEditor viewer={owner} />, at("pp-1"));
    await userEvent.click(await screen.findByRole("button", { name: "Save changes" }));
    const alert = await screen.findByRole("alert");
    expect(within(alert).getByText("Only the profile's creator can change it")).toBeInTheDocument();
    expect(alert).toHaveTextContent(message);
  });

  it("says the curve is the last valid draft while a field is not a number, without asking the server", async () => {
    const server = stubFetch((req) => preview(req));
    renderRoute(<PerilProfileEditor viewer={owner} />, { path: "/peril-lens/profiles/new", url: "/peril-lens/profiles/new" });
    await vi.waitFor(() => expect(server.count("POST", "/api/peril-profiles/preview")).toBe(1));
    const warming = screen.getByLabelText(/Warming already in the risk view/);
    await userEvent.clear(warming);
    await userEvent.type(warming, "abc");
    expect(await screen.findByText("The curve shows the last valid draft; fix the marked fields.")).toBeInTheDocument();
    expect(screen.getByText("must be a number")).toBeInTheDocument();
    expect(server.count("POST", "/api/peril-profiles/preview")).toBe(1);
  });
});
