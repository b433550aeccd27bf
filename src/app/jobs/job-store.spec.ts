import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { ActivatedRoute, convertToParamMap, provideRouter } from '@angular/router';
import { of } from 'rxjs';
import { aJobDetail, aPanel, settle } from '../../testing/fixtures';
import { ApiProblem, isStaleVersion } from '../core/api-problem';
import { errorInterceptor } from '../core/error-interceptor';
import { PanelFields } from './jobs-api';
import { JobStore } from './job-store';

const staleAnswer = { error: { code: 'stale-version', message: 'The panel has changed since version 4.' } };
const conflict = { status: 409, statusText: 'Conflict' };

describe('JobStore', () => {
  let store: JobStore;
  let http: HttpTestingController;

  function setUp(jobId: string): void {
    TestBed.configureTestingModule({
      providers: [
        JobStore,
        provideRouter([]),
        provideHttpClient(withInterceptors([errorInterceptor])),
        provideHttpClientTesting(),
        { provide: ActivatedRoute, useValue: { paramMap: of(convertToParamMap({ jobId })) } },
      ],
    });
    store = TestBed.inject(JobStore);
    http = TestBed.inject(HttpTestingController);
  }

  async function loadJob(detail = aJobDetail()): Promise<void> {
    TestBed.tick();
    http.expectOne({ method: 'GET', url: '/api/jobs/11' }).flush(detail);
    await settle();
  }

  const fields: PanelFields = {
    name: 'Left side',
    role: 'side',
    carcass: 'b1',
    width: 560,
    height: 700,
    thickness: 18,
    material: 'pb18',
  };

  afterEach(() => http.verify());

  it('loads the job of the route and names materials', async () => {
    setUp('11');
    await loadJob();

    expect(store.job()?.name).toBe('Larch Lane kitchen');
    expect(store.carcasses().map((c) => c.name)).toEqual(['Base 600']);
    expect(store.panels().map((p) => p.name)).toEqual(['Left side', 'Door']);
    expect(store.materialName('mdf19')).toBe('MDF 19 lacquer');
  });

  it('says there is no job at an address that is not a job id', () => {
    setUp('kitchen');
    TestBed.tick();

    expect(store.loadError()).toBe('There is no job at this address.');
  });

  it('sends the version it saw and shows the saved panel', async () => {
    setUp('11');
    await loadJob();

    const saving = store.updatePanel(aPanel(), fields);
    const patch = http.expectOne({ method: 'PATCH', url: '/api/panels/101' });
    expect(patch.request.body).toEqual({ ...fields, version: 4 });
    patch.flush(aPanel({ height: 700, version: 5 }));

    expect((await saving).version).toBe(5);
    expect(store.panels()[0]).toMatchObject({ height: 700, version: 5 });
  });

  it('keeps its panels as they were when someone else saved first', async () => {
    setUp('11');
    await loadJob();

    const saving = store.updatePanel(aPanel(), fields).catch((e: unknown) => e);
    http.expectOne('/api/panels/101').flush(staleAnswer, conflict);
    const error = await saving;

    expect(isStaleVersion(error)).toBe(true);
    expect((error as ApiProblem).status).toBe(409);
    expect(store.panels()[0]).toMatchObject({ height: 720, version: 4 });
  });

  it('deletes with the version in the query and drops the panel', async () => {
    setUp('11');
    await loadJob();

    const deleting = store.deletePanel(aPanel());
    http.expectOne({ method: 'DELETE', url: '/api/panels/101?version=4' }).flush(null, { status: 204, statusText: 'No Content' });
    await deleting;

    expect(store.panels().map((p) => p.dbId)).toEqual([102]);
  });

  it('adds a panel to the job of the route', async () => {
    setUp('11');
    await loadJob();

    const adding = store.addPanel(fields);
    const post = http.expectOne({ method: 'POST', url: '/api/jobs/11/panels' });
    expect(post.request.body).toEqual(fields);
    post.flush(aPanel({ dbId: 103, id: 'left-side-2', version: 1 }), { status: 201, statusText: 'Created' });
    await adding;

    expect(store.panels().map((p) => p.dbId)).toEqual([101, 102, 103]);
  });

  it('marks a panel drilled with its version', async () => {
    setUp('11');
    await loadJob();

    const marking = store.setPanelStatus(aPanel(), 'drilled');
    const patch = http.expectOne({ method: 'PATCH', url: '/api/panels/101/status' });
    expect(patch.request.body).toEqual({ status: 'drilled', version: 4 });
    patch.flush(aPanel({ status: 'drilled', version: 5 }));
    await marking;

    expect(store.panels()[0].status).toBe('drilled');
  });
});
