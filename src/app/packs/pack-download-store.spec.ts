import { HttpEventType, HttpHeaders, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { vi } from 'vitest';
import { provideRouter } from '@angular/router';
import { errorInterceptor } from '../core/error-interceptor';
import { attachmentName } from './pack-api';
import { PackDownloadStore } from './pack-download-store';

describe('PackDownloadStore', () => {
  let store: PackDownloadStore;
  let http: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [PackDownloadStore, provideRouter([]), provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()],
    });
    store = TestBed.inject(PackDownloadStore);
    http = TestBed.inject(HttpTestingController);
  });

  afterEach(() => http.verify());

  it('asks for the pack on the chosen paper and counts the bytes as they arrive', () => {
    store.start(11, 'letter');
    const request = http.expectOne({ method: 'GET', url: '/api/jobs/11/pack.zip?paper=letter' });
    expect(request.request.responseType).toBe('blob');
    expect(request.request.reportProgress).toBe(true);
    expect(store.state()).toEqual({ step: 'downloading', received: 0 });

    request.event({ type: HttpEventType.DownloadProgress, loaded: 1_500_000 });
    expect(store.state()).toEqual({ step: 'downloading', received: 1_500_000 });
    expect(store.busy()).toBe(true);

    const zip = new Blob(['PK'], { type: 'application/zip' });
    request.flush(zip, { headers: new HttpHeaders({ 'Content-Disposition': `attachment; filename="Larch Lane kitchen bench pack.zip"` }) });
    expect(store.state()).toEqual({ step: 'done', fileName: 'Larch Lane kitchen bench pack.zip', blob: zip });
    expect(store.busy()).toBe(false);
  });

  it('says why a download failed', async () => {
    store.start(11, 'a4');
    http.expectOne('/api/jobs/11/pack.zip?paper=a4').flush(new Blob(['{}']), { status: 404, statusText: 'Not Found' });

    // The error answer's schema loads on the first failure (api-problem.ts), so the words come a moment later.
    await vi.waitFor(() => expect(store.state()).toEqual({ step: 'failed', message: 'This was not found. It may have been deleted.' }));
  });

  it('drops the download under way when cancelled', () => {
    store.start(11, 'a4');
    const request = http.expectOne('/api/jobs/11/pack.zip?paper=a4');

    store.cancel();

    expect(request.cancelled).toBe(true);
    expect(store.state()).toEqual({ step: 'idle' });
  });
});

describe('attachmentName', () => {
  it('prefers the UTF-8 name, falls back to the plain one, then to the given name', () => {
    expect(attachmentName(`attachment; filename="Caf? bench pack.zip"; filename*=UTF-8''Caf%C3%A9%20bench%20pack.zip`, 'x.zip')).toBe('Café bench pack.zip');
    expect(attachmentName('attachment; filename="Side.dxf"', 'x.zip')).toBe('Side.dxf');
    expect(attachmentName(null, 'bench pack.zip')).toBe('bench pack.zip');
  });
});
