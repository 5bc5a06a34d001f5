import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { apiError } from "@/features/peril/testing/records";
import { renderRoute } from "@/testing/render-route";
import PortfolioUploadPage from "./portfolio-upload-page";

afterEach(() => vi.unstubAllGlobals());

const at = { path: "/peril-lens/portfolios/upload", url: "/peril-lens/portfolios/upload" };
const csv = () => new File(["region,peril,currency,aal,loss100,loss200\nNorth,wind,EUR,-1,2,3\n"], "baseline.csv", { type: "text/csv" });

async function checkFile() {
  await userEvent.upload(screen.getByLabelText("File (.csv or .xlsx)"), csv());
  await userEvent.click(screen.getByRole("button", { name: "Check file (nothing is saved)" }));
  return screen.findByRole("alert");
}

describe("PortfolioUploadPage states", () => {
  // The API answers row/column problems with 400 (docs/API.md); 422 is read the same way.
  it.each([400, 422])("lists every row and column problem of a refused file (%i) under one heading", async (status) => {
    stubFetch((req) =>
      req.path === "/api/portfolios/upload"
        ? apiError(status, "validation_failed", "The upload has 2 problems; nothing was saved.", [
            { path: "row 2, column D (aal)", message: "must not be negative" },
            { path: "row 2, column C (currency)", message: "must be an ISO 4217 currency code in capitals, such as EUR" },
          ])
        : undefined,
    );
    renderRoute(<PortfolioUploadPage />, at);
    const alert = await checkFile();
    expect(within(alert).getByText("The file cannot be saved as it is")).toBeInTheDocument();
    expect(alert).toHaveTextContent("The upload has 2 problems; nothing was saved.");
    const items = within(within(alert).getByRole("list", { name: "Problems in the file" })).getAllByRole("listitem");
    expect(items.map((i) => i.textContent)).toEqual(["row 2, column D (aal) must not be negative", "row 2, column C (currency) must be an ISO 4217 currency code in capitals, such as EUR"]);
    expect(screen.getByRole("button", { name: "Save portfolio" })).toBeDisabled();
  });

  it("says a role without perils:write cannot upload, with the server's sentence", async () => {
    stubFetch(() => apiError(403, "missing_permission", "The manager role lacks the permission perils:write."));
    renderRoute(<PortfolioUploadPage />, at);
    const alert = await checkFile();
    expect(within(alert).getByText("Your role cannot make this change")).toBeInTheDocument();
    expect(alert).toHaveTextContent("The manager role lacks the permission perils:write.");
    expect(within(alert).queryByRole("list")).toBeNull();
  });

  it("names a file over the size limit as too large", async () => {
    stubFetch(() => apiError(413, "payload_too_large", "Upload too large: File too large."));
    renderRoute(<PortfolioUploadPage />, at);
    const alert = await checkFile();
    expect(within(alert).getByText("The file is too large")).toBeInTheDocument();
    expect(alert).toHaveTextContent("Upload too large: File too large."); // the API passes on the upload library's words
  });

  it("asks for a check before saving once a file is chosen", async () => {
    stubFetch(() => undefined);
    renderRoute(<PortfolioUploadPage />, at);
    await userEvent.upload(screen.getByLabelText("File (.csv or .xlsx)"), csv());
    expect(screen.getByText("Check the file before saving it.")).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Save portfolio" })).toBeDisabled();
  });
});
