/**
 * Just enough of the ZIP format (APPNOTE.TXT, PKWARE, sections 4.3.7, 4.3.12, 4.3.16) to look inside an
 * XLSX package before unpacking it: the list of parts with their declared sizes from the central
 * directory, and the text of one small part. The sizes let the command line refuse a package that
 * would unpack to gigabytes before exceljs inflates any of it.
 */
import { inflateRawSync } from "node:zlib";

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

/** The bytes of one entry, inflated with its declared size as a hard cap. */
export function readZipEntry(buffer: Buffer, entry: ZipEntry): Buffer {
  const at = entry.localHeaderOffset;
  if (at + 30 > buffer.length || buffer.readUInt32LE(at) !== LOCAL) throw new ZipError(`the ZIP entry ${entry.name} is damaged`);
  const start = at + 30 + buffer.readUInt16LE(at + 26) + buffer.readUInt16LE(at + 28);
  const data = buffer.subarray(start, start + entry.compressedSize);
  if (entry.method === 0) return data;
  if (entry.method !== 8) throw new ZipError(`the ZIP entry ${entry.name} uses compression method ${entry.method}`);
  return inflateRawSync(data, { maxOutputLength: Math.max(1, entry.uncompressedSize) });
}
