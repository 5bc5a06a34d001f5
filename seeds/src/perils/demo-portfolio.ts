import type { Portfolio, PortfolioRow } from "@plumeline/contracts";
import { demoOrganisation } from "../organisation.js";

const [northmere, vellan, ostrand] = demoOrganisation.regions;

/**
 * The invented insurer's baseline figures by region and peril (illustrative, in euros):
 * average annual loss and the 1-in-100 and 1-in-200 annual losses from its own
 * catastrophe-model view. The Ostrand Uplands hail row has no demo profile on purpose, so
 * the result lists it as not projected.
 */
export const demoPortfolioRows: PortfolioRow[] = [
  { region: northmere, peril: "flood-heavy-rainfall", currency: "EUR", aal: 18_400_000, loss100: 310_000_000, loss200: 455_000_000 },
  { region: northmere, peril: "wind", currency: "EUR", aal: 25_200_000, loss100: 420_000_000, loss200: 560_000_000 },
  { region: vellan, peril: "flood-heavy-rainfall", currency: "EUR", aal: 22_100_000, loss100: 380_000_000, loss200: 540_000_000 },
  { region: vellan, peril: "heat", currency: "EUR", aal: 4_300_000, loss100: 61_000_000, loss200: 78_000_000 },
  { region: ostrand, peril: "hail", currency: "EUR", aal: 3_900_000, loss100: 52_000_000, loss200: 66_000_000 },
];

export const demoPortfolio: Portfolio = {
  id: "demo-portfolio-2025",
  name: `${demoOrganisation.name} property baseline (illustrative)`,
  rows: demoPortfolioRows,
};

/** Column order of a portfolio upload file. */
export const PORTFOLIO_COLUMNS = ["region", "peril", "currency", "aal", "loss100", "loss200"] as const;

/** The demo rows as an upload file (demo-portfolio.csv beside this file holds the same text). */
export function demoPortfolioCsv(): string {
  const lines = demoPortfolioRows.map((row) => PORTFOLIO_COLUMNS.map((c) => String(row[c])).join(","));
  return [PORTFOLIO_COLUMNS.join(","), ...lines].join("\n") + "\n";
}
