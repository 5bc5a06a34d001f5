import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { ApiError } from "@/lib/api-error";
import { UploadErrors } from "./upload-errors";

describe("UploadErrors", () => {
  it("lists every problem with the row and column the server named", () => {
    const error = new ApiError(400, "validation_failed", "The upload has 2 problems; nothing was saved.", [
      { path: "row 3, column D (aal)", message: "must not be negative" },
      { path: "row 6, column A (region)", message: 'repeats region "North" with peril "wind", already given in row 2' },
    ]);
    render(<UploadErrors error={error} />);
    expect(screen.getByRole("alert")).toHaveTextContent("nothing was saved");
    const items = within(screen.getByRole("list", { name: "Problems in the file" })).getAllByRole("listitem");
    expect(items.map((i) => i.textContent)).toEqual([
      "row 3, column D (aal) must not be negative",
      'row 6, column A (region) repeats region "North" with peril "wind", already given in row 2',
    ]);
  });
});
