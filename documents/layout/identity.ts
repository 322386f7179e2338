import { createHash, type Hash } from 'node:crypto';

function feed(hash: Hash, value: unknown): void {
  if (value === null || value === undefined) {
    hash.update(value === null ? 'n;' : 'u;');
  } else if (value instanceof Uint8Array) {
    hash.update(`b${value.byteLength}:`).update(value);
  } else if (Array.isArray(value)) {
    hash.update(`a${value.length}[`);
    for (const item of value) feed(hash, item);
    hash.update(']');
  } else if (typeof value === 'object') {
    const keys = Object.keys(value).sort();
    hash.update(`o${keys.length}{`);
    for (const key of keys) {
      hash.update(`${JSON.stringify(key)}:`);
      feed(hash, (value as Record<string, unknown>)[key]);
    }
    hash.update('}');
  } else {
    hash.update(`${typeof value}:${JSON.stringify(value)};`);
  }
}

/**
 * The PDF file identifier (ISO 32000-1, 14.4 "File identifiers": 16 bytes, conventionally an MD5
 * digest) made from the document's kind and everything it shows, pictures included, key order
 * aside. pdfkit would hash only the info dictionary, so two sheets issued on the same day under
 * the same reference would share one.
 */
export function fileIdentifier(kind: string, data: unknown): Buffer {
  const hash = createHash('md5').update(`${kind}\n`);
  feed(hash, data);
  return hash.digest();
}
