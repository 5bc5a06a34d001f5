import type { ImpactPathway, MaterialityFiring, MaterialityPolicy } from "@plumeline/contracts";

/**
 * Every threshold of the policy that a preview passes, on every pathway and horizon it covers:
 * |median shift| > medianShiftK; |change of an exceedance probability| × 100 > exceedancePoints;
 * |change of the 5–95 % width| / (comparison's width) × 100 > widthChangePercent. Strictly
 * greater: a change exactly at the limit is still within it. A comparison width of zero has
 * no relative change and is skipped (it does not occur with a sampled ECS).
 */
export function materialityFirings(pathways: ImpactPathway[], policy: MaterialityPolicy): MaterialityFiring[] {
  const fired: MaterialityFiring[] = [];
  for (const p of pathways) {
    const at = { pathwayId: p.pathway.id, pathwayName: p.pathway.name };
    const againstByYear = new Map(p.against.map((h) => [h.year, h]));
    for (const d of p.differences) {
      if (Math.abs(d.medianShift) > policy.medianShiftK)
        fired.push({ ...at, year: d.year, metric: "median-shift", warmingThreshold: null, value: d.medianShift, limit: policy.medianShiftK, unit: "K" });
      const against = againstByYear.get(d.year)?.temperature;
      const width = against && against.p95 !== undefined && against.p5 !== undefined ? against.p95 - against.p5 : 0;
      if (width > 0) {
        const percent = (d.widthChange / width) * 100;
        if (Math.abs(percent) > policy.widthChangePercent)
          fired.push({ ...at, year: d.year, metric: "width-change", warmingThreshold: null, value: percent, limit: policy.widthChangePercent, unit: "%" });
      }
      for (const [threshold, change] of Object.entries(d.exceedance)) {
        const points = change * 100;
        if (Math.abs(points) > policy.exceedancePoints)
          fired.push({ ...at, year: d.year, metric: "exceedance", warmingThreshold: Number(threshold), value: points, limit: policy.exceedancePoints, unit: "pts" });
      }
    }
  }
  return fired;
}

/**
 * A signed value with enough decimals to be seen passing its limit: a shift of 0.104 K against
 * 0.1 K reads "+0.104", never "+0.10 K > 0.1 K" (up to four decimals).
 */
function signed(v: number, digits: number, limit: number): string {
  let d = digits;
  while (d < 4 && Number(Math.abs(v).toFixed(d)) <= limit) d++;
  return `${v >= 0 ? "+" : "−"}${Math.abs(v).toFixed(d)}`;
}

/** One plain sentence per firing, e.g. "median shift +0.14 K > 0.1 K on Harbourline Middle 2050". */
export function describeFiring(f: MaterialityFiring): string {
  const where = `on ${f.pathwayName} ${f.year}`;
  switch (f.metric) {
    case "median-shift":
      return `median shift ${signed(f.value, 2, f.limit)} K > ${f.limit} K ${where}`;
    case "width-change":
      return `5–95 % width change ${signed(f.value, 1, f.limit)} % > ${f.limit} % ${where}`;
    case "exceedance":
      return `P(>${f.warmingThreshold} K) change ${signed(f.value, 1, f.limit)} pts > ${f.limit} pts ${where}`;
  }
}
