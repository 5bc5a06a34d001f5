/**
 * The libraries only exports, reports and uploads need, loaded when one is first made rather
 * than at start-up. Why: together they hold ~24 MB of the server's memory (measured: the API's
 * modules loaded with and without them, 184 against 160 MB resident), which a server that is
 * only running ensembles pays for nothing; a million-member run has to fit in 1 GiB with the
 * server around it. Node caches each module after its first load, so later calls cost nothing.
 */
export async function loadExcelJs() {
  return (await import("exceljs")).default;
}

export async function loadJsZip() {
  return (await import("jszip")).default;
}

export async function loadPdfKit() {
  return (await import("pdfkit")).default;
}
