/**
 * Test support: the parts of a ZIP package as a name → bytes map, and back to a package. Reading
 * uses the command line's own reader (src/cli/zip.ts); writing is the plain ZIP layout (APPNOTE.TXT,
 * PKWARE: local headers, central directory, end record; deflate, CRC-32 from node:zlib). Only what the
 * tests need to add parts to an XLSX written by exceljs, without another zip library.
 */
import { crc32, deflateRawSync } from "node:zlib";
import { listZip, readZipEntry } from "../../../src/cli/zip";

export function readParts(buffer: Buffer): Map<string, Buffer> {
  return new Map(listZip(buffer).map((e) => [e.name, readZipEntry(buffer, e)]));
}

export function writeParts(parts: Map<string, Buffer | string>): Buffer {
  const local: Buffer[] = [];
  const central: Buffer[] = [];
  let offset = 0;
  for (const [name, content] of parts) {
    const data = typeof content === "string" ? Buffer.from(content, "utf8") : content;
    const packed = deflateRawSync(data);
    const nameBytes = Buffer.from(name, "utf8");
    const crc = crc32(data);
    const head = Buffer.alloc(30);
    head.writeUInt32LE(0x04034b50, 0);
    head.writeUInt16LE(20, 4); // version needed
    head.writeUInt16LE(0x0800, 6); // UTF-8 names
    head.writeUInt16LE(8, 8); // deflate
    head.writeUInt32LE(crc, 14);
    head.writeUInt32LE(packed.length, 18);
    head.writeUInt32LE(data.length, 22);
    head.writeUInt16LE(nameBytes.length, 26);
    const entry = Buffer.alloc(46);
    entry.writeUInt32LE(0x02014b50, 0);
    entry.writeUInt16LE(20, 4);
    entry.writeUInt16LE(20, 6);
    entry.writeUInt16LE(0x0800, 8);
    entry.writeUInt16LE(8, 10);
    entry.writeUInt32LE(crc, 16);
    entry.writeUInt32LE(packed.length, 20);
    entry.writeUInt32LE(data.length, 24);
    entry.writeUInt16LE(nameBytes.length, 28);
    entry.writeUInt32LE(offset, 42);
    local.push(head, nameBytes, packed);
    central.push(entry, nameBytes);
    offset += 30 + nameBytes.length + packed.length;
  }
  const directory = Buffer.concat(central);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(parts.size, 8);
  end.writeUInt16LE(parts.size, 10);
  end.writeUInt32LE(directory.length, 12);
  end.writeUInt32LE(offset, 16);
  return Buffer.concat([...local, directory, end]);
}
