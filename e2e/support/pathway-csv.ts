/**
 * Pathway files in the upload format of apps/api/UPLOADS.md: `year`, then `<agent>_erf_wm2`
 * columns. The numbers are an invented stress story (not a published scenario): CO2 forcing
 * rising to 5 W m-2 by 2100, aerosol–cloud forcing strengthening to 2020 and fading after.
 */
export function goodPathwayCsv(): string {
  const lines = ["year,co2_erf_wm2,aerosol-cloud_erf_wm2,solar_erf_wm2"];
  for (let year = 1850; year <= 2100; year++) {
    const t = (year - 1850) / 250;
    const co2 = 0.2 + 4.8 * t ** 2.2;
    const aci = year <= 2020 ? -0.9 * ((year - 1850) / 170) ** 1.5 : -0.9 + 0.5 * ((year - 2020) / 80);
    lines.push(`${year},${co2.toFixed(4)},${aci.toFixed(4)},0.0100`);
  }
  return lines.join("\n") + "\n";
}

/** The same layout with two mistakes: a word where a number belongs, and a skipped year. */
export function badPathwayCsv(): string {
  return [
    "year,co2_erf_wm2,aerosol-cloud_erf_wm2",
    "1850,0.20,-0.01",
    "1851,oops,-0.01", // spreadsheet row 3, column B
    "1852,0.21,-0.02",
    "1854,0.22,-0.02", // row 5: 1853 is missing
    "",
  ].join("\n");
}
