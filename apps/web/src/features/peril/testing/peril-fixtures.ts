import type { PerilResult } from "@plumeline/contracts";

/**
 * A hand-made peril block (not engine output): every number is chosen so a test can state the
 * expected text directly. Flood (severity) projects one portfolio row; heat (frequency) has
 * return periods and no matching row; the hail row matches nothing.
 */
export function perilResultFixture(): PerilResult {
  const s = (p5: number, p17: number, p50: number, p83: number, p95: number, mean: number) => ({ p5, p17, p50, p83, p95, mean });
  return {
    portfolioId: "pf-1",
    pathways: [
      {
        pathwayId: "p1",
        profiles: [
          {
            profileId: "flood",
            name: "Flood, Northmere",
            peril: "flood-heavy-rainfall",
            region: "Northmere Coast",
            metric: "severity",
            baselineWarming: 1.1,
            horizons: [
              {
                year: 2050,
                multiplier: s(1.01, 1.03, 1.05, 1.08, 1.1, 1.051),
                returnPeriods: null,
                losses: [
                  {
                    region: "Northmere Coast",
                    peril: "flood-heavy-rainfall",
                    currency: "EUR",
                    aal: s(1010, 1030, 1050, 1080, 1100, 1051),
                    loss100: s(20200, 20600, 21000, 21600, 22000, 21020),
                    loss200: s(26260, 26780, 27300, 28080, 28600, 27326),
                  },
                ],
              },
              {
                year: 2100,
                multiplier: s(1.05, 1.1, 1.15, 1.22, 1.3, 1.16),
                returnPeriods: null,
                losses: [
                  {
                    region: "Northmere Coast",
                    peril: "flood-heavy-rainfall",
                    currency: "EUR",
                    aal: s(1050, 1100, 1150, 1220, 1300, 1160),
                    loss100: s(21000, 22000, 23000, 24400, 26000, 23200),
                    loss200: s(27300, 28600, 29900, 31720, 33800, 30160),
                  },
                ],
              },
            ],
          },
          {
            profileId: "heat",
            name: "Hot days, Vellan",
            peril: "heat",
            region: "Vellan Basin",
            metric: "frequency",
            baselineWarming: 1,
            horizons: [
              {
                year: 2050,
                multiplier: s(1.5, 1.6, 2, 2.4, 2.5, 2),
                returnPeriods: { "100": s(40, 41.7, 50, 62.5, 66.7, 51), "200": s(80, 83.3, 100, 125, 133.3, 102) },
                losses: [],
              },
            ],
          },
        ],
      },
    ],
    unmatchedRows: [{ region: "Ostrand Uplands", peril: "hail" }],
  };
}
