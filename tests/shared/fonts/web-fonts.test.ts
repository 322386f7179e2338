import fs from 'node:fs';
import path from 'node:path';

import * as fontkit from 'fontkit';

import { figures, subsetFonts, subsetRanges } from '@/scripts/font-subset';

const root = path.resolve(__dirname, '../../..');

function openFont(file: string): fontkit.Font {
  const font = fontkit.create(fs.readFileSync(file));
  if ('fonts' in font) throw new Error(`${file} is a collection, not one font`);
  return font;
}

/** Characters in the client's source (comments left out): text the UI can put on screen. */
function charactersInUiSource(): Set<string> {
  const found = new Set<string>();
  const visit = (dir: string) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) visit(full);
      else if (/\.tsx?$/.test(entry.name)) {
        const code = fs
          .readFileSync(full, 'utf8')
          .replace(/\/\*[\s\S]*?\*\//g, '')
          .replace(/(^|\s)\/\/.*$/gm, '');
        for (const ch of code) if (ch.codePointAt(0)! > 0x7e) found.add(ch);
      }
    }
  };
  for (const dir of ['app', 'components', 'constants', 'hooks', 'shared'])
    visit(path.join(root, dir));
  return found;
}

const digits = '0123456789';
const textFaces = subsetFonts.filter((font) => font.keep === 'text');
const figureFaces = subsetFonts.filter((font) => font.keep === 'figures');

/** Closed outlines of a glyph: a plain zero has two (outside, counter); a slash adds more. */
const contoursOf = (font: fontkit.Font, text: string, features: string[] = []) =>
  font.layout(text, features).glyphs[0]!.path.commands.filter((c) => c.command === 'moveTo').length;

describe.each(subsetFonts)('the web font $target', ({ source, target }) => {
  const file = path.join(root, target);
  const bytes = fs.readFileSync(file);
  const subset = openFont(file);
  const original = openFont(source);

  // W3C, WOFF File Format 2.0 (Recommendation), §5.1 "WOFF2 Header": the signature is 0x774F4632
  // ('wOF2'), the flavor is the sfnt version of the font inside (0x00010000 for TrueType outlines,
  // 'OTTO' for CFF), and `length` is the total size of the WOFF2 file.
  it('is a WOFF2 file by its header', () => {
    expect(bytes.subarray(0, 4).toString('latin1')).toBe('wOF2');
    expect([0x00010000, 0x4f54544f]).toContain(bytes.readUInt32BE(4));
    expect(bytes.readUInt32BE(8)).toBe(bytes.length);
  });

  it('decodes to the same family as the packaged .ttf', () => {
    expect(subset.familyName).toBe(original.familyName);
    expect(subset.subfamilyName).toBe(original.subfamilyName);
  });

  it('keeps every digit', () => {
    for (const ch of digits)
      expect([ch, subset.hasGlyphForCodePoint(ch.codePointAt(0)!)]).toEqual([ch, true]);
  });
});

describe.each(textFaces)('the web text font $target', ({ source, target }) => {
  const subset = openFont(path.join(root, target));
  const original = openFont(source);

  it('keeps tabular figures: with tnum all ten digits take the width they take in the .ttf', () => {
    expect(subset.availableFeatures).toContain('tnum');
    const widths = (font: fontkit.Font) =>
      font.layout(digits, ['tnum']).positions.map((p) => p.xAdvance);
    const tabular = widths(subset);
    expect(new Set(tabular).size).toBe(1);
    expect(tabular).toEqual(widths(original));
    // Without tnum the same font's figures are proportional, so the feature did the work.
    expect(new Set(subset.layout(digits).positions.map((p) => p.xAdvance)).size).toBeGreaterThan(1);
  });

  it('keeps the £ and € signs', () => {
    for (const ch of '£€')
      expect([ch, subset.hasGlyphForCodePoint(ch.codePointAt(0)!)]).toEqual([ch, true]);
  });

  it('keeps every character of the kept ranges that the .ttf has', () => {
    const missing: string[] = [];
    for (const [first, last] of subsetRanges) {
      for (let cp = first; cp <= last; cp++) {
        if (original.hasGlyphForCodePoint(cp) && !subset.hasGlyphForCodePoint(cp)) {
          missing.push(`U+${cp.toString(16).toUpperCase().padStart(4, '0')}`);
        }
      }
    }
    expect(missing).toEqual([]);
  });

  it("keeps every character the app's own text uses that the .ttf has", () => {
    const missing = [...charactersInUiSource()].filter(
      (ch) =>
        original.hasGlyphForCodePoint(ch.codePointAt(0)!) &&
        !subset.hasGlyphForCodePoint(ch.codePointAt(0)!),
    );
    expect(missing).toEqual([]);
  });
});

describe.each(figureFaces)('the web figures font $target', ({ source, target }) => {
  const subset = openFont(path.join(root, target));
  const original = openFont(source);

  it('holds the digits alone, so every other character falls through to the text face', () => {
    // fontkit lists U+FFFF, the end marker of the character map's last segment.
    const mapped = subset.characterSet.filter((cp) => cp > 0x20 && cp < 0xffff);
    expect(mapped.sort((a, b) => a - b)).toEqual([...figures].map((ch) => ch.codePointAt(0)!));
  });

  it('lines figures up: all ten digits one width, with tnum or without, as in the .ttf', () => {
    const widths = (font: fontkit.Font, features: string[]) =>
      font.layout(digits, features).positions.map((p) => p.xAdvance);
    expect(new Set(widths(subset, ['tnum'])).size).toBe(1);
    expect(widths(subset, ['tnum'])).toEqual(widths(original, ['tnum']));
    expect(widths(subset, [])).toEqual(widths(subset, ['tnum']));
  });

  it('draws a plain zero, proportional and tabular, where the text face slashes it', () => {
    expect([contoursOf(subset, '0'), contoursOf(subset, '0', ['tnum'])]).toEqual([2, 2]);
    const atkinson = openFont(
      path.join(root, textFaces.find((f) => /atkinson/.test(f.target))!.target),
    );
    expect(contoursOf(atkinson, '0')).toBeGreaterThan(2);
  });
});
