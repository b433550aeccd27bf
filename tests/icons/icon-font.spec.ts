import { readFileSync } from 'node:fs';
import fontkit from '@pdf-lib/fontkit';
import { describe, expect, it } from 'vitest';
import { FULL_FONT, SUBSET_FONT, iconsInSources, iconsInTemplate, knownIcons, missingIcons } from '../../scripts/icon-font.mjs';

// The app ships Material Symbols cut to the icons its sources name (scripts/icon-font.mjs, run by every build).
// The reference is outside the project: the material-symbols package's own font and its list of names.
const subset = readFileSync(SUBSET_FONT);
const used = iconsInSources(knownIcons());

describe('the icon font', () => {
  it('reads icon names from templates: text, and the literals an expression can give', () => {
    const template = `
      <mat-icon aria-hidden="true">delete</mat-icon>
      <mat-icon>{{ open() ? 'close' : "menu" }}</mat-icon>
      <mat-icon>{{ state() === 'saved' ? 'cloud_done' : 'cloud_off' }}</mat-icon>
      <mat-icon>{{ caution.icon }}</mat-icon>`;
    expect(iconsInTemplate(template)).toEqual(['delete', 'close', 'menu', 'cloud_done', 'cloud_off']);
  });

  it('finds the icons of templates and of code typed IconName', () => {
    expect(used.get('logout')).toEqual(['src/app/layout/shell.html']);
    expect(used.get('health_and_safety')).toEqual(['src/app/ui/caution-list.ts']);
  });

  it('draws every icon the sources name as one glyph, its ligature', () => {
    // A name the subset lacks is drawn letter by letter: the screen would show the word, not the icon.
    expect(missingIcons(subset, used)).toEqual([]);
  });

  it('lacks the icons no source names, so a template naming one fails the check above', () => {
    const unused: [string, string[]][] = [['settings', ['a template']], ['stairs', ['a template']]];
    expect(used.has('settings')).toBe(false);
    expect(missingIcons(readFileSync(FULL_FONT), unused)).toEqual([]);
    expect(missingIcons(subset, unused)).toEqual(['settings (a template)', 'stairs (a template)']);
  });

  it("draws each icon as the package's font does at its default instance (weight 400, optical size 24)", () => {
    const full = fontkit.create(readFileSync(FULL_FONT));
    const cut = fontkit.create(subset);
    for (const name of ['delete', 'logout', 'radio_button_checked', 'health_and_safety']) {
      const [a] = full.layout(name).glyphs;
      const [b] = cut.layout(name).glyphs;
      expect(b.advanceWidth).toBe(a.advanceWidth);
      const [boxA, boxB] = [a.path.bbox, b.path.bbox];
      for (const side of ['minX', 'minY', 'maxX', 'maxY'] as const) expect(boxB[side]).toBeCloseTo(boxA[side], 0);
    }
  });

  it('is a small part of the whole font', () => {
    expect(subset.length).toBeLessThan(readFileSync(FULL_FONT).length / 100);
  });
});
