import { HttpEventType, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { vi } from 'vitest';
import { provideRouter } from '@angular/router';
import { aJobSummary } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { JobImportStore } from './job-import-store';

describe('JobImportStore', () => {
  let store: JobImportStore;
  let http: HttpTestingController;
  const file = new File(['{"format":"borewright.job/1"}'], 'larch-lane.json', { type: 'application/json' });

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [
        JobImportStore,
        provideRouter([]),
        provideHttpClient(withInterceptors([errorInterceptor])),
        provideHttpClientTesting(),
      ],
    });
    store = TestBed.inject(JobImportStore);
    http = TestBed.inject(HttpTestingController);
  });

  afterEach(() => http.verify());

  it('uploads the file as the multipart field "file" and reports its progress', () => {
    store.importFile(file);
    const upload = http.expectOne({ method: 'POST', url: '/api/jobs/import' });
    expect((upload.request.body as FormData).get('file')).toBeInstanceOf(File);
    expect(store.state()).toEqual({ step: 'uploading', fileName: 'larch-lane.json', percent: 0 });

    upload.event({ type: HttpEventType.UploadProgress, loaded: 40, total: 100 });
    expect(store.state()).toEqual({ step: 'uploading', fileName: 'larch-lane.json', percent: 40 });

    upload.event({ type: HttpEventType.UploadProgress, loaded: 100, total: 100 });
    expect(store.state()).toEqual({ step: 'uploading', fileName: 'larch-lane.json', percent: null });
    expect(store.busy()).toBe(true);

    upload.flush(aJobSummary({ id: 15 }), { status: 201, statusText: 'Created' });
    expect(store.state()).toEqual({ step: 'done', job: aJobSummary({ id: 15 }) });
  });

  it('lists every problem of a refused document, each led by its path', async () => {
    store.importFile(file);
    http.expectOne('/api/jobs/import').flush(
      {
        error: {
          code: 'invalid-document',
          message: 'The job document has 2 problems.',
          details: ['panels[0].width: must be greater than 0', 'panels[2].carcass: no carcass with id "w9"'],
        },
      },
      { status: 400, statusText: 'Bad Request' },
    );

    // The error answer's schema loads on the first failure (api-problem.ts), so the words come a moment later.
    await vi.waitFor(() => expect(store.state().step).toBe('failed'));
    const state = store.state();
    expect(state.step === 'failed' && state.message).toContain('not a valid job document');
    expect(state.step === 'failed' && state.details).toEqual([
      'panels[0].width: must be greater than 0',
      'panels[2].carcass: no carcass with id "w9"',
    ]);
    expect(store.busy()).toBe(false);
  });

  it('drops the upload under way when cancelled', () => {
    store.importFile(file);
    const upload = http.expectOne('/api/jobs/import');

    store.cancel();

    expect(upload.cancelled).toBe(true);
    expect(store.state()).toEqual({ step: 'idle' });
  });
});
