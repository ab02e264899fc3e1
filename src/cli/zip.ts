/**
 * Just enough of the ZIP format (APPNOTE.TXT, PKWARE, sections 4.3.7, 4.3.12, 4.3.16) to look inside an
 * XLSX package before unpacking it: the list of parts with their declared sizes from the central
 * directory, the text of one small part, and any part inflated as a stream of chunks. The sizes let
 * the command line refuse a package that would unpack to gigabytes before exceljs inflates any of
 * it, and the stream checks every part at low memory, holding it to its declared size (a size can lie).
 */
import { createInflateRaw, inflateRawSync } from "node:zlib";

export interface ZipEntry {
  name: string;
  method: number;
  compressedSize: number;
  uncompressedSize: number;
  localHeaderOffset: number;
}

export class ZipError extends Error {}

const EOCD = 0x06054b50;
const CENTRAL = 0x02014b50;
const LOCAL = 0x04034b50;

/** The entries of the central directory (ZIP64 packages are refused: an XLSX that needs ZIP64 is beyond the limits anyway). */
export function listZip(buffer: Buffer): ZipEntry[] {
  const min = Math.max(0, buffer.length - 22 - 0xffff);
  let end = -1;
  for (let i = buffer.length - 22; i >= min; i--) {
    if (buffer.readUInt32LE(i) === EOCD) {
      end = i;
      break;
    }
  }
  if (end < 0) throw new ZipError("not a ZIP package (no end of central directory)");
  const count = buffer.readUInt16LE(end + 10);
  let offset = buffer.readUInt32LE(end + 16);
  if (offset === 0xffffffff || count === 0xffff) throw new ZipError("ZIP64 packages are not read");
  const entries: ZipEntry[] = [];
  for (let n = 0; n < count; n++) {
    if (offset + 46 > buffer.length || buffer.readUInt32LE(offset) !== CENTRAL) throw new ZipError("the ZIP central directory is damaged");
    const nameLength = buffer.readUInt16LE(offset + 28);
    const extraLength = buffer.readUInt16LE(offset + 30);
    const commentLength = buffer.readUInt16LE(offset + 32);
    entries.push({
      method: buffer.readUInt16LE(offset + 10),
      compressedSize: buffer.readUInt32LE(offset + 20),
      uncompressedSize: buffer.readUInt32LE(offset + 24),
      localHeaderOffset: buffer.readUInt32LE(offset + 42),
      name: buffer.toString("utf8", offset + 46, offset + 46 + nameLength),
    });
    offset += 46 + nameLength + extraLength + commentLength;
  }
  return entries;
}

/** The stored (compressed) bytes of one entry. */
function storedData(buffer: Buffer, entry: ZipEntry): Buffer {
  const at = entry.localHeaderOffset;
  if (at + 30 > buffer.length || buffer.readUInt32LE(at) !== LOCAL) throw new ZipError(`the ZIP entry ${entry.name} is damaged`);
  const start = at + 30 + buffer.readUInt16LE(at + 26) + buffer.readUInt16LE(at + 28);
  if (entry.method !== 0 && entry.method !== 8) throw new ZipError(`the ZIP entry ${entry.name} uses compression method ${entry.method}`);
  return buffer.subarray(start, start + entry.compressedSize);
}

const tooLarge = (entry: ZipEntry): ZipError => new ZipError(`it unpacks to more than the ${entry.uncompressedSize} bytes its directory declares`);

/** The bytes of one entry, inflated with its declared size as a hard cap. */
export function readZipEntry(buffer: Buffer, entry: ZipEntry): Buffer {
  const data = storedData(buffer, entry);
  if (entry.method === 0) return data;
  return inflateRawSync(data, { maxOutputLength: Math.max(1, entry.uncompressedSize) });
}

/**
 * Inflates one entry as a stream, handing each chunk (16 KiB) to `chunk` and keeping none: memory
 * stays low whatever the size. Rejects as soon as the output passes the declared size (ZipError), or
 * with what `chunk` throws (a limit found in the content); the inflation then stops.
 */
export function streamZipEntry(buffer: Buffer, entry: ZipEntry, chunk: (bytes: Buffer) => void): Promise<void> {
  return new Promise((resolve, reject) => {
    const data = storedData(buffer, entry);
    if (entry.method === 0) {
      if (data.length > entry.uncompressedSize) throw tooLarge(entry);
      for (let at = 0; at < data.length; at += 1 << 16) chunk(data.subarray(at, at + (1 << 16)));
      resolve();
      return;
    }
    const inflate = createInflateRaw();
    let size = 0;
    let done = false;
    const stop = (error: unknown): void => {
      if (done) return;
      done = true;
      inflate.destroy();
      reject(error);
    };
    inflate.on("data", (bytes: Buffer) => {
      if (done) return;
      size += bytes.length;
      if (size > entry.uncompressedSize) return stop(tooLarge(entry));
      try {
        chunk(bytes);
      } catch (error) {
        stop(error);
      }
    });
    inflate.on("error", (error) => stop(new ZipError(error.message)));
    inflate.on("end", () => {
      if (!done) resolve();
      done = true;
    });
    inflate.end(data);
  });
}
