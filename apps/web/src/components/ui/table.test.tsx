import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { Table, Td, Th } from "./table";

describe("Th", () => {
  it("rules a row heading like the body cells beside it, and a column heading strongly", () => {
    render(
      <Table>
        <thead>
          <tr>
            <Th>Horizon</Th>
            <Th numeric>Median</Th>
          </tr>
        </thead>
        <tbody>
          <tr>
            <Th scope="row">2050</Th>
            <Td numeric>1.41</Td>
          </tr>
        </tbody>
      </Table>,
    );
    const rowHeading = screen.getByRole("rowheader", { name: "2050" });
    expect(rowHeading.className.split(" ")).toContain("border-line");
    expect(rowHeading.className).not.toContain("border-line-strong");
    expect(screen.getByRole("cell", { name: "1.41" }).className.split(" ")).toContain("border-line");
    expect(screen.getByRole("columnheader", { name: "Horizon" }).className).toContain("border-line-strong");
  });
});
