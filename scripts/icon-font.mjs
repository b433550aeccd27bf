// The icon font the app ships: Material Symbols Outlined cut down to the icons its screens name, made before
// every build of the app (`npm run build`, `npm start`, the browser tests' build) and committed, so that
// `ng serve` and `ng test` find it too. The icons are ligatures (the text "delete" drawn as one glyph). A
// subset by the names' text alone keeps every ligature spelt with those letters (nearly all 4,000 icons), so
// the font is cut without layout closure to the names' letters and each icon's own glyph (asked for by its
// private-use code point), which keeps exactly the ligatures that end in a kept glyph. The variable font is
// pinned to the one instance the app draws (weight 400, unfilled, grade 0, optical size 24).
//
//   node scripts/icon-font.mjs        writes src/icons/material-symbols-outlined.woff2 when it changed
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import fontkit from '@pdf-lib/fontkit';

const root = fileURLToPath(new URL('..', import.meta.url));
export const FULL_FONT = join(root, 'node_modules/material-symbols/material-symbols-outlined.woff2');
export const SUBSET_FONT = join(root, 'src/icons/material-symbols-outlined.woff2');
/** The instance of the variable font that `.material-symbols-outlined` draws (its default settings). */
const INSTANCE = { wght: 400, FILL: 0, GRAD: 0, opsz: 24 };

function sourceFiles(dir) {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return sourceFiles(path);
    return /\.(html|ts)$/.test(entry.name) && !entry.name.endsWith('.spec.ts') ? [path] : [];
  });
}

/** A comparison's operand (`state() === 'saved'`) is no icon's name. */
const comparedLiteral = /(?:[=!]==?)\s*(?:'[^']*'|"[^"]*")|(?:'[^']*'|"[^"]*")\s*[=!]==?/g;
const quoted = (text) => [...text.matchAll(/'([^'\\]*)'|"([^"\\]*)"/g)].map((m) => m[1] ?? m[2]);

/**
 * The icon names a template's `<mat-icon>` elements hold: their text, and in `{{ … }}` every quoted
 * literal (`{{ open() ? 'close' : 'menu' }}`). An expression with no literal takes its names from code,
 * where they are typed `IconName` (src/app/ui/icon-name.ts).
 */
export function iconsInTemplate(template) {
  const names = [];
  for (const [, content] of template.matchAll(/<mat-icon\b[^>]*>([\s\S]*?)<\/mat-icon>/g)) {
    const text = content.replace(/\{\{[\s\S]*?\}\}/g, ' ').trim();
    if (text) names.push(text);
    for (const [, expression] of content.matchAll(/\{\{([\s\S]*?)\}\}/g)) names.push(...quoted(expression.replace(comparedLiteral, ' ')));
  }
  return names;
}

/**
 * Every icon the app's sources name, with the files naming it: templates (HTML files and inline
 * `template:`s), and in TypeScript that uses the `IconName` type, each literal that is an icon's name.
 */
export function iconsInSources(known) {
  const found = new Map();
  const add = (name, file) => found.set(name, [...new Set([...(found.get(name) ?? []), relative(root, file)])]);
  for (const file of sourceFiles(join(root, 'src/app'))) {
    const text = readFileSync(file, 'utf8');
    const templates = file.endsWith('.html') ? [text] : [...text.matchAll(/\btemplate:\s*`([\s\S]*?)`/g)].map((m) => m[1]);
    for (const template of templates) for (const name of iconsInTemplate(template)) add(name, file);
    if (file.endsWith('.ts') && /\bIconName\b/.test(text)) for (const name of quoted(text)) if (known.has(name)) add(name, file);
  }
  return found;
}

/** Every icon name the full font knows (the package's own list). */
export function knownIcons() {
  const types = readFileSync(join(root, 'node_modules/material-symbols/index.d.ts'), 'utf8');
  return new Set([...types.matchAll(/^\s*"([a-z0-9_]+)",$/gm)].map((m) => m[1]));
}

/** The glyph a font draws for an icon's name: one glyph when the font holds its ligature, else undefined. */
export function iconGlyph(font, name) {
  const glyphs = font.layout(name).glyphs;
  return glyphs.length === 1 && name.length > 1 ? glyphs[0] : undefined;
}

/** The icons the sources name that a font (woff2 bytes) cannot draw, each with the files naming it. */
export function missingIcons(fontBytes, used) {
  const font = fontkit.create(fontBytes);
  return [...used].filter(([name]) => !iconGlyph(font, name)).map(([name, files]) => `${name} (${files.join(', ')})`);
}

export async function makeIconFont() {
  const { default: subsetFont } = await import('subset-font');
  const used = iconsInSources(knownIcons());
  const original = readFileSync(FULL_FONT);
  const missing = missingIcons(original, used);
  if (missing.length > 0) throw new Error(`Material Symbols has no icon named ${missing.join('; ')}`);
  const font = fontkit.create(original);
  const codePointOf = new Map();
  for (const codePoint of font.characterSet) if (codePoint >= 0xe000) codePointOf.set(font.glyphForCodePoint(codePoint).id, codePoint);
  const names = [...used.keys()].sort();
  const glyphs = names.map((name) => String.fromCodePoint(codePointOf.get(iconGlyph(font, name).id)));
  const letters = [...new Set(names.join(''))].sort().join('');
  const subset = await subsetFont(original, letters + glyphs.join(''), { targetFormat: 'woff2', noLayoutClosure: true, variationAxes: INSTANCE });
  const changed = !existsSync(SUBSET_FONT) || !readFileSync(SUBSET_FONT).equals(subset);
  if (changed) writeFileSync(SUBSET_FONT, subset);
  return { names, bytes: subset.length, changed };
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const { names, bytes, changed } = await makeIconFont();
  console.log(`Icon font: ${names.length} icons, ${(bytes / 1000).toFixed(1)} kB woff2${changed ? ', written' : ', unchanged'} (${relative(root, SUBSET_FONT)}).`);
}
