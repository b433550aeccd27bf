import JSZip from 'jszip';
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { PDFDocument } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import type { PackManifest } from '../../shared/export/manifest';
import { makeJob, makePanel } from '../../shared/testing/make-job';
import { packCommand } from './pack-command';
import { runCli, tempFiles } from './spawn-cli';

const side = makePanel('left', { name: 'Left side', placements: [{ id: 'pin', fitting: 'shelf-pin-5', x: 37, y: 105, face: 'A' }] });
const clean = makeJob([side], { name: 'Shelf unit' });
const broken = makeJob([makePanel('left', { bores: [{ id: 'a', x: 100, y: 100, face: 'A', diameter: 5, depth: 12 }, { id: 'b', x: 104, y: 100, face: 'A', diameter: 5, depth: 12 }] })]);
const files = tempFiles({
  'clean.json': JSON.stringify(clean),
  'broken.json': JSON.stringify(broken),
  'garbled.json': '{ "format": "borewright.job/1", ',
  'invalid.json': JSON.stringify({ ...clean, panels: [{ ...clean.panels[0], width: -3 }] }),
  'machine.json': JSON.stringify({ origin: 'back-left', zZero: 'table', retract: 4, clearance: 30, breakthrough: null, tools: [{ diameter: 5, through: false, tool: 21, feed: 1000, speed: 3000 }] }),
  'bad-machine.json': JSON.stringify({ origin: 'somewhere', zZero: 'top', retract: 5, clearance: 25, breakthrough: null, tools: [] }),
});
const folder = dirname(files['clean.json']);

/** Reads a pack back with jszip, the way any zip reader would. */
async function readPack(path: string) {
  const zip = await JSZip.loadAsync(readFileSync(path));
  const manifestPath = Object.keys(zip.files).find((name) => name.endsWith('/manifest.json'))!;
  const manifest = JSON.parse(await zip.file(manifestPath)!.async('string')) as PackManifest;
  return { zip, root: dirname(manifestPath), manifest };
}

describe('borewright pack', () => {
  it('writes the pack as a zip whose manifest hashes match its files, with a progress line', async () => {
    const out = join(folder, 'clean.zip');
    const { code, stdout, stderr } = runCli('pack', files['clean.json'], '-o', out);
    expect(code).toBe(0);
    expect(stdout).toMatch(/^Wrote .*clean\.zip: 1 panels, \d+ files, [\d.]+ MB, template sheets on A4\.$/m);
    expect(stderr).toMatch(/100 % (\d+)\/\1 manifest/);
    const { zip, root, manifest } = await readPack(out);
    expect(manifest.format).toBe('borewright.pack/1');
    expect(manifest.job.name).toBe('Shelf unit');
    expect(manifest.files.map((f) => f.path)).toEqual(['cover sheet.pdf', 'panel labels.pdf', 'README.txt', 'hole schedule.csv', 'hardware list.csv', 'no carcass/Left side face A.svg', 'no carcass/Left side.dxf', 'no carcass/Left side templates A4.pdf']);
    for (const entry of manifest.files) {
      const bytes = await zip.file(`${root}/${entry.path}`)!.async('uint8array');
      // node:crypto recomputes each hash from the bytes the zip gives back.
      expect(createHash('sha256').update(bytes).digest('hex')).toBe(entry.sha256);
      expect(bytes.length).toBe(entry.bytes);
    }
    expect(readdirSync(folder).filter((f) => f.endsWith('.part'))).toEqual([]);
  });

  it('adds a drilling program beside each DXF with --gcode, following --machine when given', async () => {
    const out = join(folder, 'gcode.zip');
    const byDefault = runCli('pack', files['clean.json'], '-o', out, '--gcode');
    expect(byDefault.code).toBe(0);
    expect(byDefault.stdout).toContain('Drilling programs (G-code) drill every hole.');
    let { zip, root, manifest } = await readPack(out);
    expect(manifest.files.map((f) => f.path)).toContain('no carcass/Left side.face-a.nc');
    expect(await zip.file(`${root}/no carcass/Left side.face-a.nc`)!.async('string')).toContain('T1 M6');
    expect(runCli('pack', files['clean.json'], '-o', out, '--gcode', '--machine', files['machine.json']).code).toBe(0);
    ({ zip, root, manifest } = await readPack(out));
    const program = await zip.file(`${root}/no carcass/Left side.face-a.nc`)!.async('string');
    expect(program).toContain('T21 M6');
    expect(program).toContain('Zero X0 Y0: the back-left corner');
    expect(manifest.machine?.tools[0].tool).toBe(21);
  });

  it('exits 2 on machine settings it cannot use, naming the value, or --machine without --gcode', () => {
    const out = join(folder, 'never.zip');
    const bad = runCli('pack', files['clean.json'], '-o', out, '--gcode', '--machine', files['bad-machine.json']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/bad-machine\.json: origin: /);
    expect(runCli('pack', files['clean.json'], '-o', out, '--machine', files['machine.json']).code).toBe(2);
    expect(existsSync(out)).toBe(false);
  });

  it('tiles the templates onto US Letter with --paper letter', async () => {
    const out = join(folder, 'letter.zip');
    expect(runCli('pack', files['clean.json'], '-o', out, '--paper', 'letter').code).toBe(0);
    const { zip, root } = await readPack(out);
    const pdf = await PDFDocument.load(await zip.file(`${root}/no carcass/Left side templates US Letter.pdf`)!.async('uint8array'));
    // ANSI/ASME Y14.1 (from memory): US Letter is 8.5 × 11 in, 612 × 792 pt at 72 pt per inch.
    const { width, height } = pdf.getPage(0).getSize();
    expect([width, height].sort((a, b) => a - b).map((v) => Math.round(v * 100) / 100)).toEqual([612, 792]);
  });

  it('writes the pack of a job with errors, says so and exits 1', () => {
    const out = join(folder, 'broken.zip');
    const { code, stderr } = runCli('pack', files['broken.json'], '-o', out);
    expect(code).toBe(1);
    expect(stderr).toContain('The checks found 1 error: the pack says "contains errors" on its cover sheet.');
    expect(existsSync(out)).toBe(true);
  });

  it('exits 2 with a clear message and writes nothing for a file it cannot use', () => {
    for (const [name, message] of [
      ['garbled.json', /garbled\.json is not a job document Borewright can pack:\n {2}is not valid JSON/],
      ['invalid.json', /panels\[0\]\.width: must be greater than 0/],
      ['missing.json', /cannot be read: no such file/],
    ] as const) {
      const out = join(folder, `${name}.zip`);
      const { code, stderr } = runCli('pack', join(folder, name), '-o', out);
      expect(code).toBe(2);
      expect(stderr).toMatch(message);
      expect(existsSync(out) || existsSync(`${out}.part`)).toBe(false);
    }
  });

  it('sizes its sheets in --units and adds the inch columns to the hole schedule; mm without it', async () => {
    const out = join(folder, 'inches.zip');
    expect(runCli('pack', files['clean.json'], '-o', out, '--units', 'in-32').code).toBe(0);
    const { zip, root } = await readPack(out);
    // The side, 560 × 720 mm: 560 / 25.4 = 22.047 in = 705.5/32 → 22 1/16; 720 / 25.4 = 28.346 in = 907.09/32 → 28 11/32
    // (the international inch, 25.4 mm: NIST SP 811, published). The pin at y 105 = 4.134 in = 132.3/32 → 4 1/8.
    expect(await zip.file(`${root}/no carcass/Left side face A.svg`)!.async('string')).toContain('22 1/16&quot; × 28 11/32&quot;');
    const schedule = await zip.file(`${root}/hole schedule.csv`)!.async('string');
    expect(schedule).toContain('y in inches');
    expect(schedule).toContain(',"4 1/8""",');
    const metric = await readPack(join(folder, 'clean.zip'));
    expect(await metric.zip.file(`${metric.root}/hole schedule.csv`)!.async('string')).not.toContain('in inches');
    const unknown = runCli('pack', files['clean.json'], '-o', join(folder, 'never.zip'), '--units', 'in-16');
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toContain('borewright pack: --units must be one of mm, in, in-32, in-64, not "in-16".');
    expect(existsSync(join(folder, 'never.zip'))).toBe(false);
    expect(runCli('pack', '--help').stdout).toContain('--units mm|in|in-32|in-64');
  });

  it('exits 2 on missing or wrong options, and on an output it cannot write', () => {
    expect(runCli('pack', files['clean.json']).stderr).toContain('say where to write the pack with -o <pack.zip>');
    expect(runCli('pack', files['clean.json'], '-o', join(folder, 'x.zip'), '--paper', 'a3').stderr).toContain('--paper must be a4 or letter, not "a3"');
    const unwritable = runCli('pack', files['clean.json'], '-o', join(folder, 'no-such-folder', 'x.zip'));
    expect(unwritable.code).toBe(2);
    expect(unwritable.stderr).toContain('its folder does not exist');
  });

  it('rewrites one progress line in place on a terminal', async () => {
    const written: string[] = [];
    const io = { out: () => undefined, err: () => undefined };
    const code = await packCommand([files['clean.json'], '-o', join(folder, 'tty.zip')], io, { isTTY: true, columns: 60, write: (text) => written.push(text) });
    expect(code).toBe(0);
    expect(written.length).toBeGreaterThan(3);
    expect(written.slice(0, -1).every((w) => w.startsWith('\r') && w.length === 60)).toBe(true);
    expect(written.at(-2)).toContain('100 %');
    expect(written.at(-1)).toBe('\n');
  }, 60_000);
});
