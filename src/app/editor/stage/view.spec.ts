import { describe, expect, it } from 'vitest';
import { fitView, pinchView, toPanel, toScreen, viewOfBox, zoomAt } from './view';

describe('view', () => {
  const stage = { width: 800, height: 600 };
  const panel = { width: 560, height: 720 };

  it('fits the panel and maps panel points to the screen and back, y running up', () => {
    const view = fitView(panel, stage, false);
    expect(view.scale).toBeCloseTo((600 - 96) / 720);
    const origin = toScreen(view, { x: 0, y: 0 });
    const top = toScreen(view, { x: 0, y: 720 });
    expect(top.y).toBeLessThan(origin.y);
    expect(toPanel(view, toScreen(view, { x: 37, y: 105 }))).toEqual({ x: expect.closeTo(37), y: expect.closeTo(105) });
  });

  it('shows face B mirrored: the reference edge on the right', () => {
    const view = fitView(panel, stage, true);
    expect(toScreen(view, { x: 0, y: 0 }).x).toBeGreaterThan(toScreen(view, { x: 560, y: 0 }).x);
    expect(toPanel(view, toScreen(view, { x: 37, y: 105 })).x).toBeCloseTo(37);
  });

  it('zooms about the pointer, keeping the point under it still', () => {
    const view = fitView(panel, stage, false);
    const at = { x: 300, y: 200 };
    const before = toPanel(view, at);
    const after = toPanel(zoomAt(view, at, 2), at);
    expect(after.x).toBeCloseTo(before.x);
    expect(after.y).toBeCloseTo(before.y);
  });

  it('pinches: fingers twice as far apart double the scale, and the panel point under their midpoint follows it', () => {
    const view = fitView(panel, stage, false);
    const from = [{ x: 350, y: 300 }, { x: 450, y: 300 }] as const;
    const to = [{ x: 280, y: 260 }, { x: 480, y: 260 }] as const;
    const under = toPanel(view, { x: 400, y: 300 });
    const pinched = pinchView(view, from, to);
    expect(pinched.scale).toBeCloseTo(view.scale * 2);
    const now = toPanel(pinched, { x: 380, y: 260 });
    expect(now.x).toBeCloseTo(under.x);
    expect(now.y).toBeCloseTo(under.y);
  });

  it('centres a finding\'s box', () => {
    const view = viewOfBox([30, 90, 44, 120], stage, false);
    const centre = toScreen(view, { x: 37, y: 105 });
    expect(centre.x).toBeCloseTo(400);
    expect(centre.y).toBeCloseTo(300);
  });
});
