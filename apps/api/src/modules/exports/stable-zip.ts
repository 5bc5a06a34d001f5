import { loadJsZip } from "../../lazy-modules.js";

/**
 * Rewrites a zip (an .xlsx is one) with every entry dated `date`, in the same order, so the
 * same content always gives the same bytes: zip writers stamp entries with the clock, which
 * would make a rebuilt export differ from its recorded checksum although nothing in it did.
 */
export async function withFixedEntryDates(bytes: Buffer, date: Date): Promise<Buffer> {
  const JSZip = await loadJsZip();
  const source = await JSZip.loadAsync(bytes);
  const out = new JSZip();
  for (const entry of Object.values(source.files)) {
    if (entry.dir) continue;
    // No folder entries: JSZip would stamp those with the clock.
    out.file(entry.name, await entry.async("nodebuffer"), { date, createFolders: false });
  }
  return out.generateAsync({ type: "nodebuffer", compression: "DEFLATE", platform: "UNIX" });
}
