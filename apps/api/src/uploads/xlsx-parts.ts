/**
 * Guarded unpacking of an uploaded XLSX (a ZIP of XML parts) before the workbook library sees
 * it. WHY: ExcelJS inflates every part in full before it reads a cell, so a 0.6 MB upload that
 * expands to 600 MB took seconds and gigabytes. Here the ZIP directory is read first (yauzl):
 * too many entries, or declared sizes over the caps, are refused without inflating anything.
 * Then only the parts a table needs are inflated, counting bytes as they come, so an entry
 * that lies about its size is cut off at the cap too. The kept parts are re-packed (stored,
 * not compressed; fflate) into a small workbook that ExcelJS can read safely.
 */
import { zipSync } from "fflate";
import yauzl, { type Entry, type ZipFile } from "yauzl";
import { AppError } from "../errors/app-error.js";

/** Entries a workbook may hold at all. Ours have about 10; a spreadsheet app's a few dozen. */
export const MAX_XLSX_ENTRIES = 500;
/** Declared uncompressed size of the whole archive (all parts, needed or not). */
export const MAX_XLSX_DECLARED_BYTES = 64 * 1024 * 1024;
/** Bytes inflated from the parts a table needs (1,000 years x 12 columns is ~1 MB of XML). */
export const MAX_XLSX_READ_BYTES = 32 * 1024 * 1024;

/** The parts a table needs: the package and workbook manifests, the sheets, shared strings, styles. */
const NEEDED_PART = /^(\[Content_Types\]\.xml|_rels\/\.rels|xl\/workbook\.xml|xl\/_rels\/workbook\.xml\.rels|xl\/sharedStrings\.xml|xl\/styles\.xml|xl\/worksheets\/[^/]+\.xml)$/;

const MB = (bytes: number) => `${Math.round(bytes / (1024 * 1024))} MB`;

export class XlsxTooLargeError extends AppError {
  constructor(message: string) {
    super(413, "xlsx_too_large_unpacked", message, [{ path: "file", message }]);
  }
}

/** Raised for bytes that are not a readable ZIP at all (the caller words it for the user). */
export class XlsxNotAZipError extends Error {}

/** The parts of `buffer` a table needs, re-packed as a small workbook; refuses bombs with 413. */
export async function extractNeededXlsxParts(buffer: Buffer): Promise<Buffer> {
  let zip: ZipFile;
  try {
    zip = await yauzl.fromBufferPromise(buffer, { lazyEntries: true, validateEntrySizes: true, autoClose: false });
  } catch (error) {
    throw new XlsxNotAZipError(`it is not a readable XLSX (ZIP) file: ${(error as Error).message}`);
  }
  try {
    const entries = await listEntries(zip);
    const needed = entries.filter((e) => NEEDED_PART.test(e.fileName));
    const parts: Record<string, Uint8Array> = {};
    let budget = MAX_XLSX_READ_BYTES;
    for (const entry of needed) {
      const data = await inflateCapped(zip, entry, budget);
      budget -= data.length;
      parts[entry.fileName] = data;
    }
    // Level 0: the parts are stored, not compressed again; ExcelJS only reads them.
    return Buffer.from(zipSync(parts, { level: 0 }));
  } finally {
    zip.close();
  }
}

/** Every entry of the ZIP directory, checking the count and the declared sizes as it goes. */
function listEntries(zip: ZipFile): Promise<Entry[]> {
  if (zip.entryCount > MAX_XLSX_ENTRIES)
    return Promise.reject(new XlsxTooLargeError(`The workbook holds ${zip.entryCount} parts; at most ${MAX_XLSX_ENTRIES} are accepted.`));
  return new Promise((resolve, reject) => {
    const entries: Entry[] = [];
    let declared = 0;
    zip.on("entry", (entry: Entry) => {
      declared += entry.uncompressedSize;
      if (declared > MAX_XLSX_DECLARED_BYTES) {
        reject(
          new XlsxTooLargeError(
            `The workbook unpacks to more than ${MB(MAX_XLSX_DECLARED_BYTES)} (its part "${entry.fileName}" alone declares ${MB(entry.uncompressedSize)}); a table needs far less. Save the sheet on its own, without images or other sheets' data.`,
          ),
        );
        return;
      }
      entries.push(entry);
      zip.readEntry();
    });
    zip.on("end", () => resolve(entries));
    zip.on("error", (error: Error) => reject(new XlsxNotAZipError(`its ZIP directory could not be read: ${error.message}`)));
    zip.readEntry();
  });
}

/** Inflates one entry, refusing as soon as it passes `budget` bytes (whatever it declared). */
function inflateCapped(zip: ZipFile, entry: Entry, budget: number): Promise<Buffer> {
  const tooLarge = () =>
    new XlsxTooLargeError(
      `The workbook unpacks to more than ${MB(MAX_XLSX_READ_BYTES)} in the parts a table needs ("${entry.fileName}"); a table needs far less.`,
    );
  if (entry.uncompressedSize > budget) return Promise.reject(tooLarge());
  return new Promise((resolve, reject) => {
    zip.openReadStream(entry, (openError, stream) => {
      if (openError || !stream) {
        reject(new XlsxNotAZipError(`its part "${entry.fileName}" could not be opened: ${openError?.message ?? "no data"}`));
        return;
      }
      const chunks: Buffer[] = [];
      let read = 0;
      let settled = false;
      const fail = (error: Error) => {
        if (settled) return;
        settled = true;
        stream.destroy();
        reject(error);
      };
      stream.on("data", (chunk: Buffer) => {
        read += chunk.length;
        if (read > budget) fail(tooLarge());
        else chunks.push(chunk);
      });
      // yauzl checks the inflated length against the declared one (validateEntrySizes): a
      // part that inflates past what it declared is a lie, refused like an oversized one.
      stream.on("error", (error: Error) => fail(/too many bytes|bytes in the stream/i.test(error.message) ? tooLarge() : new XlsxNotAZipError(`its part "${entry.fileName}" could not be unpacked: ${error.message}`)));
      stream.on("end", () => {
        if (settled) return;
        settled = true;
        resolve(Buffer.concat(chunks));
      });
    });
  });
}
