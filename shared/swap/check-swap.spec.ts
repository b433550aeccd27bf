import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { fitting, type Catalog } from '../catalog/fitting';
import { mergeShopFittings } from '../catalog/merge-catalog';
import { makeJob, makePanel, type PanelInput } from '../testing/make-job';
import { applySwap, checkSwap, panelsBackToPlanned } from './check-swap';
import type { SwapReport } from './swap-report';

const catalog = builtinCatalog();

/** The report, or the test fails with the refusal's message. */
function report(job: ReturnType<typeof makeJob>, from: string, to: string, with_: Catalog = catalog): SwapReport {
  const result = checkSwap(job, with_, from, to);
  if (!result.ok) throw new Error(result.message);
  return result.report;
}

const at = (bore: { kind: string; x?: number; y?: number }) => [bore.x, bore.y];

// A 496 × 716 × 18 MDF door hung 2 mm up its left side, two hinges 87 mm from its ends (cup centre 76 to
// 100 mm from the top and bottom, trade-reference §2, common practice), cup-boring distance B = 4 mm so the
// cup centre is B + 17.5 = 21.5 mm from the hinge edge (§2, common practice). The plates meet the cups at
// 87 + 2 = 89 and 629 + 2 = 631 on the side.
const side: PanelInput = makePanel('left', {
  placements: [
    { id: 'plate-1', fitting: 'plate-0', x: 37, y: 89, face: 'A' },
    { id: 'plate-2', fitting: 'plate-0', x: 37, y: 631, face: 'A' },
  ],
});
const door = (status: 'planned' | 'drilled' | 'checked', hinge = 'hinge-full-overlay-45'): PanelInput =>
  makePanel('door', {
    role: 'door',
    width: 496,
    height: 716,
    material: 'mdf18',
    status,
    hang: { on: ['left'], dy: 2 },
    placements: [
      { id: 'hinge-1', fitting: hinge, x: 21.5, y: 87, face: 'A', params: { boringDistance: 4 } },
      { id: 'hinge-2', fitting: hinge, x: 21.5, y: 629, face: 'A', params: { boringDistance: 4 } },
    ],
  });

describe('checkSwap: a 45/9.5 hinge for a 48/6 hinge on a drilled door', () => {
  // The worked example (trade-reference §2, common practice for both screw-hole patterns):
  // 45/9.5 drills two Ø8 holes 45 mm apart, 9.5 mm further from the door edge than the cup centre;
  // 48/6 two Ø8 holes 48 mm apart, 6 mm further. Hinge 1's cup centre is at (21.5, 87), so
  //   old fix-1 (21.5 + 9.5, 87 − 22.5) = (31, 64.5)     old fix-2 (31, 109.5)
  //   new fix-1 (21.5 + 6,   87 − 24)   = (27.5, 63)     new fix-2 (27.5, 111)
  // The Ø35 cup is the same bore at the same centre (the placement stays, so the cup-boring distance does): reused.
  // New fix-1 against old fix-1: dx = 3.5, dy = 1.5, centres √(3.5² + 1.5²) = √14.5 = 3.81 mm apart, while two
  // Ø8 holes need 4 + 4 = 8 mm just to touch: they overlap by 8 − 3.81 = 4.19 mm, far short of the 3 mm web
  // (trade-reference §7, common practice), so the new hole cannot be drilled. The same for fix-2, mirrored.
  // New fix-1 against old fix-2 is 48.6 mm away: no clash. New fix-1 against the cup: √(6² + 24²) − 17.5 − 4
  // = 3.24 mm of web, and in any case a fitting's own holes sit as its maker spaced them.
  // The old fix holes are on face A, the back of the door: unused but not on a visible face.
  const job = makeJob([side, door('drilled')]);
  const swap = report(job, 'hinge-full-overlay-45', 'hinge-full-overlay-48');
  const [panel] = swap.panels;

  it('finds the door, and only the door, with both hinges', () => {
    expect(swap.panels.map((p) => p.panel.id)).toEqual(['door']);
    expect(panel.placements).toEqual(['hinge-1', 'hinge-2']);
    expect(panel.panel).toMatchObject({ role: 'door', status: 'drilled' });
    expect(panel.drilled).toBe(true);
  });

  it('reuses the cups as they are', () => {
    expect(panel.reused.map((r) => [r.bore.id, r.uses, ...at(r.bore), r.bore.diameter])).toEqual([
      ['hinge-1/cup', 'hinge-1/cup', 21.5, 87, 35],
      ['hinge-2/cup', 'hinge-2/cup', 21.5, 629, 35],
    ]);
  });

  it('needs the four 48/6 screw holes, and every one clashes with a 45/9.5 hole', () => {
    expect(panel.new).toEqual([]);
    expect(panel.clashing.map((c) => [c.bore.id, ...at(c.bore)])).toEqual([
      ['hinge-1/fix-1', 27.5, 63],
      ['hinge-1/fix-2', 27.5, 111],
      ['hinge-2/fix-1', 27.5, 605],
      ['hinge-2/fix-2', 27.5, 653],
    ]);
    const first = panel.clashing[0];
    expect(first.with.map((w) => [w.bore.id, ...at(w.bore), w.unused, w.code])).toEqual([['hinge-1/fix-1', 31, 64.5, true, 'bores-overlap']]);
    // The checks' own words, with the old hole named as such: 3.81 − 8 = −4.19, rounded to 4.2.
    expect(first.with[0].message).toBe('Bore hinge-1/fix-1 (Ø8 × 11) and old bore hinge-1/fix-1 (Ø8 × 11) on face A overlap by 4.2 mm; keep at least 3 mm.');
    expect(panel.clashing[1].with.map((w) => [w.bore.id, ...at(w.bore)])).toEqual([['hinge-1/fix-2', 31, 109.5]]);
  });

  it('leaves the four 45/9.5 holes unused, on the back face where they do not show', () => {
    expect(panel.unused.map((u) => [u.bore.id, ...at(u.bore), u.visible])).toEqual([
      ['hinge-1/fix-1', 31, 64.5, false],
      ['hinge-1/fix-2', 31, 109.5, false],
      ['hinge-2/fix-1', 31, 606.5, false],
      ['hinge-2/fix-2', 31, 651.5, false],
    ]);
  });

  it('calls the drilled door to be remade, and sends it back to planned once applied', () => {
    expect(panel.verdict).toBe('to-remake');
    expect(swap.summary).toEqual({ panels: 1, placements: 2, fine: 0, toDrill: 0, toRemake: 1, notDrilled: 0, reused: 2, new: 0, clashing: 4, unused: 4, unusedVisible: 0 });
    expect(panelsBackToPlanned(swap)).toEqual(['door']);
  });

  it('leaves the plates alone and says so; the cups still meet them', () => {
    expect(applySwap(job, 'hinge-full-overlay-45', 'hinge-full-overlay-48').panels[0]).toEqual(job.panels[0]);
    expect(swap.notes).toEqual([
      'The mounting plates the swapped cups meet stay as they are (2 × plate-0 on left): a swap changes only the fitting it names. Swap the plates too if the new hinge needs others.',
    ]);
    expect(swap.findings.added.filter((f) => f.code === 'hinge-unpaired')).toEqual([]);
  });

  it('says a door not drilled yet simply gets the new plan', () => {
    const planned = report(makeJob([side, door('planned')]), 'hinge-full-overlay-45', 'hinge-full-overlay-48');
    expect(planned.panels[0]).toMatchObject({ verdict: 'to-remake', drilled: false });
    expect(planned.summary).toMatchObject({ toRemake: 0, notDrilled: 1 });
    expect(panelsBackToPlanned(planned)).toEqual([]);
  });

  it('finds nothing new in the swapped plan itself: the old holes are not in it', () => {
    expect(swap.findings).toEqual({ added: [], resolved: 0 });
  });
});

describe('checkSwap verdicts', () => {
  it('calls a hinge with the same holes fine, and says what changes in the overlay', () => {
    // Full and half overlay 45/9.5 hinges drill the same holes; their constants are 13 and 5 mm, so by
    // overlay = K + B − plate height (trade-reference §2, common practice) the overlay drops by 8 mm.
    const swap = report(makeJob([side, door('checked')]), 'hinge-full-overlay-45', 'hinge-half-overlay-45');
    expect(swap.panels[0]).toMatchObject({ verdict: 'fine', new: [], clashing: [], unused: [] });
    expect(swap.panels[0].reused).toHaveLength(6);
    expect(swap.summary).toMatchObject({ fine: 1, toDrill: 0, toRemake: 0 });
    expect(swap.notes.slice(0, 2)).toEqual([
      'Cup hinge, half overlay, 45/9.5 is made for half overlay, Cup hinge, full overlay, 45/9.5 for full overlay: the fronts will sit differently on the carcass.',
      'Overlay = hinge constant + B − plate height (trade-reference §2, common practice): the constant goes from 13 mm to 5 mm, so each front\'s overlay changes by −8 mm.',
    ]);
  });

  it('calls shorter runners on a drilled side to drill: the front screw stays, the rear ones move', () => {
    // Runners: front screw on the 37 mm row, rear screws 32·k behind it (trade-reference §6, common practice).
    // The 500 runner's rear holes are 224 and 416 behind the front one, the 400 runner's 160 and 320: at
    // x = 37 + 160 = 197 and 357 they are 64 and 96 mm from the old ones at 261 and 453, far from any clash.
    const drawerSide = makePanel('drawer-left', {
      status: 'drilled',
      placements: [{ id: 'runner-1', fitting: 'runner-500', x: 37, y: 105, face: 'A' }],
    });
    const swap = report(makeJob([drawerSide]), 'runner-500', 'runner-400');
    const [panel] = swap.panels;
    expect(panel.reused.map((r) => [r.bore.id, ...at(r.bore)])).toEqual([['runner-1/front', 37, 105]]);
    expect(panel.new.map((n) => [n.bore.id, ...at(n.bore)])).toEqual([
      ['runner-1/rear-1', 197, 105],
      ['runner-1/rear-2', 357, 105],
    ]);
    expect(panel.unused.map((u) => [u.bore.id, ...at(u.bore), u.visible])).toEqual([
      ['runner-1/rear-1', 261, 105, false],
      ['runner-1/rear-2', 453, 105, false],
    ]);
    expect(panel.verdict).toBe('to-drill');
    expect(swap.summary).toMatchObject({ toDrill: 1, new: 2, unused: 2 });
    expect(swap.notes).toEqual(["The new runner is 400 mm long, the old one 500 mm: check the drawer boxes' length and the carcass depth."]);
  });

  it('reuses a hole another fitting drills, and names a kept hole in the way', () => {
    // A shelf-pin hole (Ø5, a system hole) where the 400 runner's first rear screw goes is one hole for both;
    // one 5 mm above the second rear screw leaves 5 − 2.5 − 2.5 = 0 mm of web (trade-reference §7: 3 mm).
    const drawerSide = makePanel('drawer-left', {
      status: 'drilled',
      placements: [
        { id: 'runner-1', fitting: 'runner-500', x: 37, y: 105, face: 'A' },
        { id: 'pin-1', fitting: 'shelf-pin-5', x: 197, y: 105, face: 'A' },
        { id: 'pin-2', fitting: 'shelf-pin-5', x: 357, y: 110, face: 'A' },
      ],
    });
    const [panel] = report(makeJob([drawerSide]), 'runner-500', 'runner-400').panels;
    expect(panel.reused.map((r) => [r.bore.id, r.uses])).toEqual([
      ['runner-1/front', 'runner-1/front'],
      ['runner-1/rear-1', 'pin-1/pin'],
    ]);
    expect(panel.new).toEqual([]);
    expect(panel.clashing.map((c) => [c.bore.id, c.with.map((w) => [w.bore.id, w.unused])])).toEqual([['runner-1/rear-2', [['pin-2/pin', false]]]]);
    expect(panel.verdict).toBe('to-remake');
  });

  it('deepens the holes for longer dowels rather than drilling new ones', () => {
    // 8 × 30 dowels go about 21 mm into the edge and 11 into the face, 8 × 35 about 24 and 13
    // (trade-reference §6, published, WOODWEB Knowledge Base 1998): the same holes, deeper.
    const top = makePanel('top', {
      role: 'top',
      status: 'drilled',
      placements: [
        { id: 'dowel-1', fitting: 'dowel-8x30-edge', x: 37, y: 0, face: 'A' },
        { id: 'dowel-2', fitting: 'dowel-8x30-face', x: 37, y: 300, face: 'A' },
      ],
    });
    const edge = report(makeJob([top]), 'dowel-8x30-edge', 'dowel-8x35-edge').panels[0];
    expect(edge.new.map((n) => [n.bore.id, n.bore.depth, n.deepens])).toEqual([['dowel-1/dowel', 24, 'dowel-1/dowel']]);
    expect(edge).toMatchObject({ verdict: 'to-drill', reused: [], clashing: [], unused: [] });
    const face = report(makeJob([top]), 'dowel-8x30-face', 'dowel-8x35-face').panels[0];
    expect(face.new.map((n) => [n.bore.id, n.bore.depth, n.deepens])).toEqual([['dowel-2/dowel', 13, 'dowel-2/dowel']]);
  });

  it('calls a door to be remade when an old hole shows on its front', () => {
    // A handle of 128 mm centres for one of 160 (invented test fittings): through holes, so the old ones
    // show on the front face B. New and old are 16 mm apart, 11 mm of web between Ø5 holes: no clash.
    const handle = (id: string, centres: number) =>
      fitting.parse({
        id,
        name: `Bar handle, ${centres} mm centres`,
        purpose: 'construction',
        onSystemRow: false,
        bores: [-1, 1].map((s, i) => ({ id: `screw-${i + 1}`, kind: 'face', x: 0, y: (s * centres) / 2, diameter: 5, depth: 'through', source: 'invented for a test' })),
      });
    const shop = mergeShopFittings(catalog, [handle('handle-128', 128), handle('handle-160', 160)]).catalog;
    const front = makePanel('door', { role: 'door', status: 'drilled', placements: [{ id: 'pull', fitting: 'handle-128', x: 40, y: 600, face: 'A' }] });
    const [panel] = report(makeJob([front]), 'handle-128', 'handle-160', shop).panels;
    expect(panel.new.map((n) => at(n.bore))).toEqual([[40, 520], [40, 680]]);
    expect(panel.unused.map((u) => [...at(u.bore), u.visible])).toEqual([[40, 536, true], [40, 664, true]]);
    expect(panel.verdict).toBe('to-remake');
  });

  it('runs the checks on the swapped job: a stronger lift mechanism throws the flap open', () => {
    // A 300 mm high (in its frame, its width), 800 mm long, 18 mm MDF flap at 700 kg/m³ weighs
    // 0.3 × 0.8 × 0.018 × 700 = 3.024 kg, so PF = 300 × 3.024 = 907 (trade-reference §3, common practice):
    // in the light mechanism's range 500 to 1300, below the strong one's 2200 to 4000.
    const left = makePanel('left', { placements: [{ id: 'lift', fitting: 'lift-light', x: 37, y: 600, face: 'A' }] });
    const flap = makePanel('flap', { role: 'flap', width: 300, height: 800, material: 'mdf18', hang: { on: ['left'], dy: 700 } });
    const swap = report(makeJob([left, flap]), 'lift-light', 'lift-strong');
    expect(swap.panels[0].verdict).toBe('fine');
    expect(swap.findings.added.map((f) => [f.code, f.panel, f.severity])).toEqual([['lift-out-of-range', 'left', 'error']]);
    expect(swap.findings.added[0].message).toContain('too strong');
  });
});

describe('checkSwap refusals', () => {
  const job = makeJob([side, door('drilled')]);
  it('refuses a replacement of another kind, naming both kinds', () => {
    expect(checkSwap(job, catalog, 'hinge-full-overlay-45', 'plate-0')).toEqual({
      ok: false,
      code: 'different-kind',
      field: 'to',
      message: 'to: "plate-0" is a mounting plate and "hinge-full-overlay-45" a cup hinge; a swap replaces a fitting by one of the same kind.',
    });
  });

  it('refuses fittings the catalog does not know, and a fitting for itself', () => {
    expect(checkSwap(job, catalog, 'hinge-9', 'plate-0')).toMatchObject({ code: 'unknown-fitting', field: 'from', message: 'from: "hinge-9": no fitting of the catalog has this id.' });
    expect(checkSwap(job, catalog, 'plate-0', 'plate-9')).toMatchObject({ code: 'unknown-fitting', field: 'to' });
    expect(checkSwap(job, catalog, 'plate-0', 'plate-0')).toMatchObject({ code: 'same-fitting', field: 'to' });
    const unknown = makeJob([makePanel('p', { placements: [{ id: 'x', fitting: 'mystery-hinge', x: 20, y: 100, face: 'A' }] })]);
    expect(checkSwap(unknown, catalog, 'mystery-hinge', 'hinge-full-overlay-48')).toMatchObject({
      code: 'unknown-fitting',
      message: 'from: "mystery-hinge": the job places it, but the catalog does not know its holes; import the fitting first.',
    });
  });

  it('answers a fitting the job does not use with an empty report', () => {
    const swap = report(job, 'runner-500', 'runner-400');
    expect(swap.panels).toEqual([]);
    expect(swap.summary.panels).toBe(0);
    expect(swap.notes).toEqual(['The job has no placement of runner-500: the swap changes nothing.']);
  });
});

describe('applySwap', () => {
  it('gives every placement of the old fitting the new one and changes nothing else', () => {
    const job = makeJob([side, door('drilled')]);
    const after = applySwap(job, 'hinge-full-overlay-45', 'hinge-full-overlay-48');
    expect(after.panels[1].placements.map((p) => p.fitting)).toEqual(['hinge-full-overlay-48', 'hinge-full-overlay-48']);
    expect(after.panels[1].placements.map(({ fitting: _f, ...rest }) => rest)).toEqual(job.panels[1].placements.map(({ fitting: _f, ...rest }) => rest));
    expect(job.panels[1].placements[0].fitting).toBe('hinge-full-overlay-45');
    expect(after.panels[1].status).toBe('drilled');
  });
});
