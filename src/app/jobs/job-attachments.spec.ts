import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { AttachmentSummary } from '../../../shared/api/attachment-contract';
import { Role } from '../../../shared/api/contract';
import { accessibleName, settle, signInAs } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { JobAttachments } from './job-attachments';

const photo: AttachmentSummary = {
  id: 7,
  jobId: 11,
  filename: 'site wall.png',
  contentType: 'image/png',
  size: 812 * 1024,
  uploadedBy: 'Tomas Ward',
  uploadedAt: '2026-11-30T09:15:00.000Z',
};

describe('JobAttachments', () => {
  let fixture: ComponentFixture<JobAttachments>;
  let page: HTMLElement;
  let http: HttpTestingController;

  async function openAs(role: Role): Promise<void> {
    TestBed.configureTestingModule({ providers: [provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()] });
    http = TestBed.inject(HttpTestingController);
    await signInAs(role);
    fixture = TestBed.createComponent(JobAttachments);
    fixture.componentRef.setInput('jobId', 11);
    page = fixture.nativeElement;
    TestBed.tick();
    http.expectOne('/api/jobs/11/attachments').flush({ attachments: [photo], maxBytes: 10 * 1024 * 1024 });
    await settle();
    await fixture.whenStable();
  }

  afterEach(() => http.verify());

  const controls = () => [...page.querySelectorAll('button, a')].map(accessibleName);
  const text = (selector: string) => page.querySelector(selector)?.textContent?.replace(/\s+/g, ' ').trim();

  it('lets a viewer download but neither attach nor delete, and states the limit', async () => {
    await openAs('viewer');

    expect(controls()).toEqual(['Download site wall.png']);
    expect(page.querySelector('a')!.getAttribute('href')).toBe('/api/attachments/7');
    expect(text('.meta')).toMatch(/^PNG image · 812 kB · Tomas Ward, 30 Nov 2026/);
    expect(text('.intro')).toContain('up to 10 MB each');
  });

  it('uploads with progress for a designer and lists what the server stored', async () => {
    await openAs('designer');
    expect(controls()).toEqual(['Attach photo or PDF', 'Download site wall.png', 'Delete site wall.png']);

    const input = page.querySelector<HTMLInputElement>('input[type=file]')!;
    const file = new File(['%PDF-1.7'], 'drawing.pdf', { type: 'application/pdf' });
    Object.defineProperty(input, 'files', { value: { item: () => file, length: 1 }, configurable: true });
    input.dispatchEvent(new Event('change'));
    await fixture.whenStable();
    const request = http.expectOne('/api/jobs/11/attachments');
    expect(text('.progress')).toMatch(/^Uploading drawing\.pdf: 0 %/);
    request.flush({ ...photo, id: 8, filename: 'drawing.pdf', contentType: 'application/pdf', size: 583 }, { status: 201, statusText: 'Created' });
    await settle();
    await fixture.whenStable();

    expect([...page.querySelectorAll('.name')].map((n) => n.textContent)).toEqual(['site wall.png', 'drawing.pdf']);
    expect(page.querySelector('.progress')).toBeNull();
  });

  it('says why a file was refused', async () => {
    await openAs('designer');
    const input = page.querySelector<HTMLInputElement>('input[type=file]')!;
    const file = new File(['text'], 'fake.png', { type: 'image/png' });
    Object.defineProperty(input, 'files', { value: { item: () => file, length: 1 }, configurable: true });
    input.dispatchEvent(new Event('change'));
    http
      .expectOne('/api/jobs/11/attachments')
      .flush({ error: { code: 'unsupported-file-type', message: 'This file is named or sent as a PNG image, but it is not one.' } }, { status: 415, statusText: 'Unsupported Media Type' });
    await settle();
    await fixture.whenStable();

    expect(text('[role=alert] .bw-alert-text')).toBe('fake.png was not attached. This file is named or sent as a PNG image, but it is not one.');
    expect(page.querySelectorAll('.item')).toHaveLength(1);
  });
});
