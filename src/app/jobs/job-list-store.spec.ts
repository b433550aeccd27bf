import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { aJobSummary, settle } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { JobListStore } from './job-list-store';

describe('JobListStore', () => {
  let store: JobListStore;
  let http: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [
        JobListStore,
        provideRouter([]),
        provideHttpClient(withInterceptors([errorInterceptor])),
        provideHttpClientTesting(),
      ],
    });
    store = TestBed.inject(JobListStore);
    http = TestBed.inject(HttpTestingController);
  });

  afterEach(() => http.verify());

  async function answerList(archived: boolean, body: object): Promise<void> {
    TestBed.tick();
    http.expectOne({ method: 'GET', url: `/api/jobs?archived=${archived}` }).flush(body);
    await settle();
  }

  it('lists the current jobs, then the archived ones on request', async () => {
    expect(store.loading()).toBe(true);
    await answerList(false, { jobs: [aJobSummary()] });
    expect(store.jobs().map((j) => j.name)).toEqual(['Larch Lane kitchen']);
    expect(store.loading()).toBe(false);

    store.setShowArchived(true);
    await answerList(true, { jobs: [aJobSummary(), aJobSummary({ id: 12, name: 'Old porch', archived: true })] });
    expect(store.jobs().map((j) => j.name)).toEqual(['Larch Lane kitchen', 'Old porch']);
  });

  it('says so when the answer does not match the contract', async () => {
    await answerList(false, { jobs: [{ id: 'eleven', name: 'Larch Lane kitchen' }] });

    expect(store.jobs()).toEqual([]);
    expect(store.loadError()).toContain('shape this page does not understand');
  });

  it('says why the list could not be loaded', async () => {
    TestBed.tick();
    http.expectOne('/api/jobs?archived=false').flush(null, { status: 0, statusText: 'Unknown Error' });
    await settle();

    expect(store.loadError()).toBe('The Borewright server cannot be reached. Check the connection and try again.');
  });

  it('creates a job, validates the answer and lists it again', async () => {
    await answerList(false, { jobs: [] });

    const creating = store.createJob({ name: 'Boot room bench', client: 'M. Ives' });
    const post = http.expectOne({ method: 'POST', url: '/api/jobs' });
    expect(post.request.body).toEqual({ name: 'Boot room bench', client: 'M. Ives' });
    post.flush(aJobSummary({ id: 12, name: 'Boot room bench', client: 'M. Ives', carcassCount: 0, panelCount: 0 }), {
      status: 201,
      statusText: 'Created',
    });

    expect((await creating).id).toBe(12);
    await answerList(false, { jobs: [aJobSummary({ id: 12, name: 'Boot room bench' })] });
    expect(store.jobs().map((j) => j.id)).toEqual([12]);
  });

  it('archives a job through PATCH and lists again', async () => {
    await answerList(false, { jobs: [aJobSummary()] });

    const archiving = store.updateJob(aJobSummary(), { archived: true });
    const patch = http.expectOne({ method: 'PATCH', url: '/api/jobs/11' });
    expect(patch.request.body).toEqual({ archived: true, version: 3 });
    patch.flush(aJobSummary({ archived: true }));
    await archiving;

    await answerList(false, { jobs: [] });
    expect(store.jobs()).toEqual([]);
  });
});
