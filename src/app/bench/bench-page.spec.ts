import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { PanelRecord, Role } from '../../../shared/api/contract';
import { accessibleName, aJobDetail, aJobSummary, aPanel, buttonNamed, settle, signInAs } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { vi } from 'vitest';
import { BenchPage } from './bench-page';
import { BenchStore } from './bench-store';
import { RETRY_FIRST_MS } from './mark-queue';
import { MARK_STORE, MarkStore, QueuedMark } from './mark-store';

/** The queue's store as IndexedDB keeps it, in memory: marks by `seq`, listed in order of making. */
function memoryMarkStore(): MarkStore & { marks: Map<number, QueuedMark> } {
  const marks = new Map<number, QueuedMark>();
  let next = 1;
  return {
    marks,
    add: async (mark) => {
      const seq = next++;
      marks.set(seq, { ...mark, seq });
      return seq;
    },
    list: async (userId) => [...marks.values()].filter((m) => m.userId === userId).sort((a, b) => a.seq - b.seq),
    put: async (mark) => void marks.set(mark.seq, mark),
    remove: async (seq) => void marks.delete(seq),
  };
}

describe('BenchPage', () => {
  let http: HttpTestingController;
  let harness: RouterTestingHarness;
  let page: HTMLElement;
  let store: ReturnType<typeof memoryMarkStore>;

  const side = aPanel();
  const door = aPanel({ dbId: 102, id: 'b1-door', name: 'Door', role: 'door', material: 'mdf19', status: 'drilled', statusBy: 'Ada Keel', statusAt: '2026-12-01T10:02:00.000Z' });
  // A bore on face B gives the loose shelf a second drilling map.
  const loose = aPanel({ dbId: 103, id: 'shelf', name: 'Loose shelf', role: 'shelf', carcass: undefined, bores: [{ id: 'p1', face: 'B', x: 50, y: 50, diameter: 5, depth: 10 }] });
  const findings = {
    errors: 1,
    warnings: 0,
    notes: 0,
    findings: [{ code: 'bores-overlap', severity: 'error', message: 'Two bores overlap.', panel: side.id, bores: [], placements: [], fixes: [] }],
  };

  /** Opens the bench; the server answers the queue's question whether it can be reached as `health` says (the offline worker answers 504). */
  async function openAs(role: Role, url: string, kept = memoryMarkStore(), health: 'answers' | 'unreachable' = 'answers'): Promise<void> {
    store = kept;
    TestBed.configureTestingModule({
      providers: [
        provideRouter([{ path: 'bench', component: BenchPage }]),
        provideHttpClient(withInterceptors([errorInterceptor])),
        provideHttpClientTesting(),
        { provide: MARK_STORE, useValue: store },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    await signInAs(role);
    harness = await RouterTestingHarness.create();
    await harness.navigateByUrl(url);
    await settle();
    TestBed.tick();
    http.expectOne((r) => r.url === '/api/jobs').flush({ jobs: [aJobSummary()] });
    http.expectOne('/api/jobs/11').flush(aJobDetail([side, door, loose]));
    http.expectOne('/api/jobs/11/findings').flush(findings);
    await stable();
    // With no mark of the member's to send, the queue asks whether the server answers.
    const asked = http.expectOne('/api/health');
    if (health === 'answers') asked.flush({ ok: true });
    else asked.flush('', { status: 504, statusText: 'Gateway Timeout' });
    await stable();
    page = harness.routeNativeElement!;
  }

  async function stable(): Promise<void> {
    await settle();
    TestBed.tick();
    await harness.fixture.whenStable();
  }

  const cardNames = () => [...page.querySelectorAll('bw-bench-panel-card .name')].map((n) => n.textContent!.trim());
  const progress = () => page.querySelector('bw-panel-progress .bar')!.getAttribute('aria-label');
  const saved = (panel: PanelRecord, changes: Partial<PanelRecord>) => ({ ...panel, version: panel.version + 1, ...changes });
  const banner = () => page.querySelector('.connection')?.textContent?.replace(/\s+/g, ' ').trim();
  const state = (name: string) =>
    accessibleName([...page.querySelectorAll('bw-bench-panel-card')].find((c) => c.querySelector('.name')!.textContent!.trim() === name)!.querySelector('.state')!);
  async function click(name: string): Promise<void> {
    buttonNamed(name)!.click();
    await stable();
  }
  async function goOffline(): Promise<void> {
    window.dispatchEvent(new Event('offline'));
    await stable();
  }
  async function comeOnline(): Promise<void> {
    window.dispatchEvent(new Event('online'));
    await stable();
  }

  afterEach(() => http.verify());

  it('shows the drilling caution, the panels of the chosen carcass still to drill, their findings, progress and labels', async () => {
    await openAs('bench', '/bench?job=11&carcass=b1');

    expect(page.querySelector('[role="note"]')!.textContent).toContain('check the 100 mm bar on every page before drilling');
    // The bench assembles the chosen job's units too: their cautions beside drilling's (design.md §8).
    expect([...page.querySelectorAll('[data-caution]')].map((c) => c.getAttribute('data-caution'))).toEqual(['drilling', 'tall-unit']);
    expect(cardNames()).toEqual(['Left side']);
    expect(page.textContent).toContain('1 error');
    expect(page.textContent).toContain('Face A up (inside face)');
    expect(progress()).toBe('Panels of Base 600: 0 of 2 checked, 1 drilled and waiting to be checked, 1 still to drill.');
    expect(page.querySelector<HTMLAnchorElement>('a.labels')!.getAttribute('href')).toBe('/api/jobs/11/labels.pdf?carcass=b1');
  });

  it('lists drilled and checked panels too when asked, saying who marked them', async () => {
    await openAs('bench', '/bench?job=11&carcass=b1&done=show');

    expect(cardNames()).toEqual(['Left side', 'Door']);
    expect(page.textContent).toContain('Drilled by Ada Keel');
  });

  it('marks a panel drilled, keeps it listed, and undoes the mark', async () => {
    await openAs('bench', '/bench?job=11');
    expect(cardNames()).toEqual(['Left side', 'Loose shelf']);
    expect(buttonNamed('Checked: Left side')!.disabled).toBe(true);

    await click('Drilled: Left side');
    const mark = http.expectOne({ method: 'PATCH', url: '/api/panels/101/status' });
    expect(mark.request.body).toEqual({ status: 'drilled', version: 4 });
    const drilled = saved(side, { status: 'drilled', statusBy: 'Ada Keel', statusAt: '2026-12-02T08:00:00.000Z' });
    mark.flush(drilled);
    await stable();

    expect(cardNames()).toEqual(['Left side', 'Loose shelf']);
    expect(page.textContent).toContain('Drilled by Ada Keel');
    expect(buttonNamed('Checked: Left side')!.disabled).toBe(false);
    expect(buttonNamed('Drilled: Left side')!.getAttribute('aria-pressed')).toBe('true');
    expect(page.querySelector('.undo-bar')!.textContent).toContain('Marked “Left side” drilled.');
    expect(progress()).toContain('0 of 3 checked, 2 drilled');

    await click('Undo');
    const undo = http.expectOne({ method: 'PATCH', url: '/api/panels/101/status' });
    expect(undo.request.body).toEqual({ status: 'planned', version: 5 });
    undo.flush(saved(drilled, { status: 'planned', statusBy: null, statusAt: null }));
    await stable();

    expect(page.querySelector('.undo-bar')).toBeNull();
    expect(page.textContent).toContain('Not drilled yet');
    expect(progress()).toContain('0 of 3 checked, 1 drilled');
  });

  it('says why a mark was refused, shows the panel as it is now, and keeps the reason until it is read', async () => {
    await openAs('bench', '/bench?job=11');

    await click('Drilled: Left side');
    http
      .expectOne({ method: 'PATCH', url: '/api/panels/101/status' })
      .flush({ error: { code: 'stale-version', message: 'Someone else changed this panel since you loaded it.' } }, { status: 409, statusText: 'Conflict' });
    await settle();
    TestBed.tick();
    // The page asks for the job again, to show the panel as someone else marked it.
    http.expectOne('/api/jobs/11').flush(aJobDetail([saved(side, { status: 'drilled', statusBy: 'Tomas Ward', statusAt: '2026-12-02T08:00:00.000Z' }), door, loose]));
    await stable();

    expect(page.querySelector('[role="alert"]')!.textContent).toContain('“Left side” was not marked drilled: Someone else changed this panel since you loaded it.');
    expect(page.textContent).toContain('Drilled by Tomas Ward');
    expect(page.querySelector('.undo-bar')).toBeNull();

    // Kept until the member says they have read it; then it goes, from the page and the device.
    await stable();
    expect(page.querySelector('[role="alert"]')).not.toBeNull();
    await click('OK, “Left side” was not marked');
    expect(page.querySelector('[role="alert"]')).toBeNull();
    expect(store.marks.size).toBe(0);
  });

  it('keeps marks made offline on the device, shows them waiting, and sends them in order with the versions they lead to', async () => {
    await openAs('bench', '/bench?job=11');
    await goOffline();
    expect(banner()).toContain('The bench is offline. Marks are kept on this device and sent when the connection returns. No marks waiting to send.');

    await click('Drilled: Left side');
    // Checked follows drilled at once, though the server has not heard of either yet.
    expect(buttonNamed('Checked: Left side')!.disabled).toBe(false);
    await click('Checked: Left side');
    await click('Drilled: Loose shelf');
    http.expectNone({ method: 'PATCH' });
    expect(banner()).toContain('3 marks waiting to send.');
    expect(state('Left side')).toBe('Checked, waiting to send');
    expect(progress()).toContain('1 of 3 checked, 2 drilled');
    expect([...store.marks.values()].map((m) => [m.panelDbId, m.to, m.version])).toEqual([
      [101, 'drilled', 4],
      [101, 'checked', 4],
      [103, 'drilled', 4],
    ]);

    await comeOnline();
    const first = http.expectOne({ method: 'PATCH', url: '/api/panels/101/status' });
    expect(first.request.body).toEqual({ status: 'drilled', version: 4 });
    const drilled = saved(side, { status: 'drilled', statusBy: 'Demo bench', statusAt: '2026-12-02T08:00:00.000Z' });
    first.flush(drilled);
    await stable();
    // The second mark of the same panel goes with the version the first one gave it.
    const second = http.expectOne({ method: 'PATCH', url: '/api/panels/101/status' });
    expect(second.request.body).toEqual({ status: 'checked', version: 5 });
    second.flush(saved(drilled, { status: 'checked' }));
    await stable();
    const third = http.expectOne({ method: 'PATCH', url: '/api/panels/103/status' });
    expect(third.request.body).toEqual({ status: 'drilled', version: 4 });
    third.flush(saved(loose, { status: 'drilled', statusBy: 'Demo bench', statusAt: '2026-12-02T08:01:00.000Z' }));
    await stable();

    expect(store.marks.size).toBe(0);
    expect(banner()).toBeUndefined();
    expect(state('Left side')).toMatch(/^Checked by Demo bench/);
    expect(progress()).toContain('1 of 3 checked, 2 drilled');
  });

  it('holds back the marks made on top of a refused one, and says why for each', async () => {
    await openAs('bench', '/bench?job=11');
    await goOffline();
    await click('Drilled: Left side');
    await click('Checked: Left side');

    await comeOnline();
    http
      .expectOne({ method: 'PATCH', url: '/api/panels/101/status' })
      .flush({ error: { code: 'stale-version', message: 'Someone else changed this panel since you loaded it.' } }, { status: 409, statusText: 'Conflict' });
    await settle();
    TestBed.tick();
    http.expectOne('/api/jobs/11').flush(aJobDetail([saved(side, { status: 'drilled', statusBy: 'Tomas Ward', statusAt: '2026-12-02T08:00:00.000Z' }), door, loose]));
    await stable();
    http.expectNone({ method: 'PATCH' });

    const alerts = [...page.querySelectorAll('.refused')].map((a) => a.textContent!.replace(/\s+/g, ' '));
    expect(alerts).toEqual([
      expect.stringContaining('“Left side” was not marked drilled: Someone else changed this panel since you loaded it.'),
      expect.stringContaining('“Left side” was not marked checked: Not sent: the mark before it on “Left side” was refused.'),
    ]);
    expect(state('Left side')).toMatch(/^Drilled by Tomas Ward/);
    expect(page.querySelector('.undo-bar')).toBeNull();
  });

  it('keeps a mark the server could not be reached for, and sends it when the connection returns', async () => {
    await openAs('bench', '/bench?job=11');
    await click('Drilled: Left side');
    // The offline worker answers 504 when the network is gone.
    http.expectOne({ method: 'PATCH', url: '/api/panels/101/status' }).flush('', { status: 504, statusText: 'Gateway Timeout' });
    await stable();
    expect(banner()).toContain('The bench is offline.');
    expect(banner()).toContain('1 mark waiting to send.');
    expect(state('Left side')).toBe('Drilled, waiting to send');

    await comeOnline();
    http.expectOne({ method: 'PATCH', url: '/api/panels/101/status' }).flush(saved(side, { status: 'drilled', statusBy: 'Demo bench', statusAt: '2026-12-02T08:00:00.000Z' }));
    await stable();
    expect(banner()).toBeUndefined();
    expect(state('Left side')).toMatch(/^Drilled by Demo bench/);
  });

  it('says the bench is offline when the server cannot be reached though the browser says it is online, until the server answers again', async () => {
    // Time runs on by itself (the page settles on timeouts) and can be jumped to the queue's next try.
    vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout'], shouldAdvanceTime: true });
    try {
      await openAs('bench', '/bench?job=11', memoryMarkStore(), 'unreachable');
      expect(navigator.onLine).toBe(true);
      expect(banner()).toContain('The bench is offline. Marks are kept on this device and sent when the connection returns. No marks waiting to send.');

      await vi.advanceTimersByTimeAsync(RETRY_FIRST_MS);
      http.expectOne('/api/health').flush({ ok: true });
      await stable();
      expect(banner()).toBeUndefined();
    } finally {
      vi.useRealTimers();
    }
  });

  it('neither shows nor sends the marks another member left waiting on this device', async () => {
    const theirs = { userId: 99, jobId: 11, panelDbId: 101, name: 'Left side', from: 'planned', to: 'drilled', version: 4, madeAt: '2026-12-02T08:00:00.000Z' } as const;
    const before = memoryMarkStore();
    await before.add(theirs);
    await openAs('bench', '/bench?job=11', before);

    http.expectNone({ method: 'PATCH' });
    expect(banner()).toBeUndefined();
    expect(state('Left side')).toBe('Not drilled yet');
    expect(before.marks.size).toBe(1);
  });

  it('reads the listed panels’ templates and maps once each, one at a time, for the offline worker to keep', async () => {
    await openAs('bench', '/bench?job=11');
    const bench = harness.routeDebugElement!.injector.get(BenchStore);
    let open = 0;
    const asked: string[] = [];
    const fetch = vi.spyOn(globalThis, 'fetch').mockImplementation(async (url) => {
      expect(++open).toBe(1);
      asked.push(String(url));
      await settle();
      open--;
      return new Response('file');
    });
    try {
      await bench.keepFilesOffline();
    } finally {
      fetch.mockRestore();
    }
    expect(asked).toEqual([
      '/api/panels/101/template.pdf?paper=a4',
      '/api/panels/101/drilling-map.svg?face=A',
      '/api/panels/103/template.pdf?paper=a4',
      '/api/panels/103/drilling-map.svg?face=A',
      '/api/panels/103/drilling-map.svg?face=B',
    ]);
    expect(bench.filesKept()).toEqual({ done: 2, total: 2 });
  });

  it('opens one panel with its drilling map, as its label’s QR code asks', async () => {
    await openAs('viewer', '/bench?job=11&panel=102');

    expect(cardNames()).toEqual(['Door']);
    expect([...page.querySelectorAll('img')].map((i) => i.getAttribute('src'))).toEqual(['/api/panels/102/drilling-map.svg?face=A']);
    expect(page.querySelector<HTMLAnchorElement>('a.labels')!.getAttribute('href')).toBe('/api/jobs/11/labels.pdf?panels=102');
    // A viewer reads; only the roles that mark panels get the buttons.
    expect([...page.querySelectorAll('button')].map(accessibleName).filter((n) => /^(Drilled|Checked):/.test(n))).toEqual([]);
  });
});
