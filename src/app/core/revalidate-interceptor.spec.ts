import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { firstValueFrom } from 'rxjs';
import { revalidateInterceptor } from './revalidate-interceptor';

describe('revalidateInterceptor', () => {
  let client: HttpClient;
  let http: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideHttpClient(withInterceptors([revalidateInterceptor])), provideHttpClientTesting()],
    });
    client = TestBed.inject(HttpClient);
    http = TestBed.inject(HttpTestingController);
  });

  afterEach(() => http.verify());

  async function get(url: string, answer: { body: object | null; etag?: string; status?: number }, expectTag?: string) {
    const result = firstValueFrom(client.get(url));
    const req = http.expectOne(url);
    expect(req.request.headers.get('If-None-Match')).toBe(expectTag ?? null);
    req.flush(answer.body, { status: answer.status ?? 200, statusText: 'x', headers: answer.etag ? { ETag: answer.etag } : {} });
    return result;
  }

  it('asks with the last tag and gives the kept job on 304, the new one on 200', async () => {
    expect(await get('/api/jobs/1', { body: { name: 'Kitchen' }, etag: 'W/"job-1-a"' })).toEqual({ name: 'Kitchen' });
    expect(await get('/api/jobs/1', { body: null, status: 304, etag: 'W/"job-1-a"' }, 'W/"job-1-a"')).toEqual({ name: 'Kitchen' });
    expect(await get('/api/jobs/1', { body: { name: 'Kitchen, phase 2' }, etag: 'W/"job-1-b"' }, 'W/"job-1-a"')).toEqual({ name: 'Kitchen, phase 2' });
    expect(await get('/api/jobs/1', { body: null, status: 304, etag: 'W/"job-1-b"' }, 'W/"job-1-b"')).toEqual({ name: 'Kitchen, phase 2' });
  });

  it('keeps nothing for an answer without a tag, and passes on a 304 it has nothing for', async () => {
    await get('/api/jobs', { body: { jobs: [] } });
    await get('/api/jobs', { body: { jobs: [] } });
    const failed = firstValueFrom(client.get('/api/other')).catch((e: unknown) => e);
    http.expectOne('/api/other').flush(null, { status: 304, statusText: 'Not Modified' });
    expect(await failed).toMatchObject({ status: 304 });
  });
});
