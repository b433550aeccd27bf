import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { ActivatedRoute, convertToParamMap, provideRouter } from '@angular/router';
import { of } from 'rxjs';
import { builtinCatalog } from '../../../shared/catalog/builtin-catalog';
import { checkSwap } from '../../../shared/swap/check-swap';
import { makeJob, makePanel } from '../../../shared/testing/make-job';
import { aJobDetail, aPanel, settle } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { SwapStore } from './swap-store';

const hinges = [
  { id: 'hinge-1', fitting: 'hinge-full-overlay-45', x: 21.5, y: 87, face: 'A' as const, rotation: 0 as const },
  { id: 'hinge-2', fitting: 'hinge-full-overlay-45', x: 21.5, y: 629, face: 'A' as const, rotation: 0 as const },
];
const door = aPanel({ dbId: 102, id: 'b1-door', name: 'Door', role: 'door', version: 7, placements: hinges });
const side = aPanel({ placements: [{ id: 'plate-1', fitting: 'plate-0', x: 37, y: 89, face: 'A', rotation: 0 }] });
const catalog = { fittings: [...builtinCatalog().values()].map((fitting) => ({ fitting, origin: 'built-in' })) };

/** The server's answer, made by the same shared code the server runs. */
function answer() {
  const result = checkSwap(makeJob([makePanel('b1-door', { role: 'door', width: 496, height: 716, placements: hinges })]), builtinCatalog(), 'hinge-full-overlay-45', 'hinge-full-overlay-48');
  if (!result.ok) throw new Error(result.message);
  return { report: result.report, versions: { 'b1-door': 7 } };
}

describe('SwapStore', () => {
  let store: SwapStore;
  let http: HttpTestingController;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      providers: [
        SwapStore,
        provideRouter([]),
        provideHttpClient(withInterceptors([errorInterceptor])),
        provideHttpClientTesting(),
        { provide: ActivatedRoute, useValue: { paramMap: of(convertToParamMap({ jobId: '11' })) } },
      ],
    });
    store = TestBed.inject(SwapStore);
    http = TestBed.inject(HttpTestingController);
    TestBed.tick();
    http.expectOne('/api/jobs/11').flush(aJobDetail([side, door]));
    http.expectOne('/api/catalog').flush(catalog);
    await settle();
  });

  afterEach(() => http.verify());

  it('offers only the fittings the job places, and replacements of the same kind', () => {
    expect(store.loading()).toBe(false);
    expect(store.used().map((f) => [f.id, f.placements, f.panels])).toEqual([
      ['hinge-full-overlay-45', 2, 1],
      ['plate-0', 1, 1],
    ]);
    store.chooseFrom('hinge-full-overlay-45');
    expect(store.candidates().map((f) => f.id)).toEqual(expect.arrayContaining(['hinge-half-overlay-45', 'hinge-full-overlay-48']));
    expect(store.candidates().every((f) => f.purpose === 'hinge-cup' && f.id !== 'hinge-full-overlay-45')).toBe(true);
    TestBed.tick();
    http.expectNone((req) => req.url.endsWith('/swap'));
  });

  it('asks for the report, and applies it at the versions it was made from', async () => {
    store.chooseFrom('hinge-full-overlay-45');
    store.chooseTo('hinge-full-overlay-48');
    TestBed.tick();
    const get = http.expectOne((req) => req.url === '/api/jobs/11/swap');
    expect(get.request.params.get('from')).toBe('hinge-full-overlay-45');
    expect(get.request.params.get('to')).toBe('hinge-full-overlay-48');
    get.flush(answer());
    await settle();
    expect(store.report()?.summary).toMatchObject({ panels: 1, clashing: 4 });
    expect(store.retrofitPanels()).toEqual([]);

    const applying = store.apply();
    const post = http.expectOne({ method: 'POST', url: '/api/jobs/11/swap' });
    expect(post.request.body).toEqual({ from: 'hinge-full-overlay-45', to: 'hinge-full-overlay-48', versions: { 'b1-door': 7 } });
    post.flush({ from: 'hinge-full-overlay-45', to: 'hinge-full-overlay-48', panels: 1, placements: 2, backToPlanned: [] });
    expect((await applying).placements).toBe(2);
    expect(store.from()).toBeUndefined();
    TestBed.tick();
    http.expectOne('/api/jobs/11').flush(aJobDetail([side, door]));
  });
});
