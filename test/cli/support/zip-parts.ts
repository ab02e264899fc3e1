/**
 * Test support: the parts of a ZIP package as a name → bytes map, and back to a package. Reading
 * uses the command line's own reader (src/cli/zip.ts); writing is the plain ZIP layout (APPNOTE.TXT,
 * PKWARE: local headers, central directory, end record; deflate, CRC-32 from node:zlib). Only what the
 * tests need to add parts to an XLSX written by exceljs, without another zip library.
 */
import { crc32, createDeflateRaw, deflateRawSync } from "node:zlib";
import { listZip, readZipEntry } from "../../../src/cli/zip";

export function readParts(buffer: Buffer): Map<string, Buffer> {
  return new Map(listZip(buffer).map((e) => [e.name, readZipEntry(buffer, e)]));
}

/** A part deflated already (a large one, made by deflatedRepeat), with its true size and CRC-32. */
export interface PackedPart {
  packed: Buffer;
  size: number;
  crc: number;
  /** The uncompressed size written in the headers instead of the true one (a package that lies). */
  declared?: number;
}

/**
 * head + body × times + tail, deflated as a stream: a part of hundreds of megabytes made without
 * holding it in memory (the compressed bytes are small, as in a zip bomb).
 */
export async function deflatedRepeat(head: string, body: string, times: number, tail: string): Promise<PackedPart> {
  const deflate = createDeflateRaw({ level: 1 });
  const out: Buffer[] = [];
  deflate.on("data", (b: Buffer) => out.push(b));
  const finished = new Promise((resolve, reject) => deflate.on("end", resolve).on("error", reject));
  const block = Buffer.from(body.repeat(Math.max(1, Math.floor((1 << 20) / body.length))));
  const perBlock = block.length / Buffer.byteLength(body);
  let crc = 0;
  let size = 0;
  const write = async (bytes: Buffer): Promise<void> => {
    crc = crc32(bytes, crc);
    size += bytes.length;
    if (!deflate.write(bytes)) await new Promise((resolve) => deflate.once("drain", resolve));
  };
  await write(Buffer.from(head));
  let left = times;
  for (; left >= perBlock; left -= perBlock) await write(block);
  if (left > 0) await write(Buffer.from(body.repeat(left)));
  await write(Buffer.from(tail));
  deflate.end();
  await finished;
  return { packed: Buffer.concat(out), size, crc };
}

export function writeParts(parts: Map<string, Buffer | string | PackedPart>): Buffer {
  const local: Buffer[] = [];
  const central: Buffer[] = [];
  let offset = 0;
  for (const [name, content] of parts) {
    let packed: Buffer;
    let crc: number;
    let size: number;
    if (typeof content === "string" || Buffer.isBuffer(content)) {
      const data = typeof content === "string" ? Buffer.from(content, "utf8") : content;
      packed = deflateRawSync(data);
      crc = crc32(data);
      size = data.length;
    } else {
      packed = content.packed;
      crc = content.crc;
      size = content.declared ?? content.size;
    }
    const nameBytes = Buffer.from(name, "utf8");
    const head = Buffer.alloc(30);
    head.writeUInt32LE(0x04034b50, 0);
    head.writeUInt16LE(20, 4); // version needed
    head.writeUInt16LE(0x0800, 6); // UTF-8 names
    head.writeUInt16LE(8, 8); // deflate
    head.writeUInt32LE(crc, 14);
    head.writeUInt32LE(packed.length, 18);
    head.writeUInt32LE(size, 22);
    head.writeUInt16LE(nameBytes.length, 26);
    const entry = Buffer.alloc(46);
    entry.writeUInt32LE(0x02014b50, 0);
    entry.writeUInt16LE(20, 4);
    entry.writeUInt16LE(20, 6);
    entry.writeUInt16LE(0x0800, 8);
    entry.writeUInt16LE(8, 10);
    entry.writeUInt32LE(crc, 16);
    entry.writeUInt32LE(packed.length, 20);
    entry.writeUInt32LE(size, 24);
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
