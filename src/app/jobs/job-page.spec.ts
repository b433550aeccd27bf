import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { Role } from '../../../shared/api/contract';
import { accessibleName, aJobDetail, buttonNamed, settle, signInAs } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { JobPage } from './job-page';

describe('JobPage', () => {
  let http: HttpTestingController;
  let page: HTMLElement;

  const noFindings = { errors: 0, warnings: 0, notes: 0, findings: [] };

  async function openAs(role: Role, findings: object = noFindings): Promise<void> {
    TestBed.configureTestingModule({
      providers: [
        provideRouter([{ path: 'jobs/:jobId', component: JobPage }]),
        provideHttpClient(withInterceptors([errorInterceptor])),
        provideHttpClientTesting(),
      ],
    });
    http = TestBed.inject(HttpTestingController);
    await signInAs(role);
    const harness = await RouterTestingHarness.create();
    await harness.navigateByUrl('/jobs/11');
    http.expectOne('/api/jobs/11').flush(aJobDetail());
    await settle();
    // The bench pack asks for the job's findings once the job is shown: one tick draws it, the next sends its request.
    TestBed.tick();
    TestBed.tick();
    http.expectOne('/api/jobs/11/findings').flush(findings);
    http.expectOne('/api/jobs/11/attachments').flush({ attachments: [], maxBytes: 10 * 1024 * 1024 });
    await settle();
    await harness.fixture.whenStable();
    page = harness.routeNativeElement!;
  }

  const buttonNames = () => [...page.querySelectorAll('button, a')].map(accessibleName);
  const statusSelects = () => page.querySelectorAll('mat-select').length;
  const overlay = () => document.querySelector('.cdk-overlay-container') as HTMLElement;

  afterEach(() => http.verify());

  it('shows a viewer the job and its export, and no control to change anything', async () => {
    await openAs('viewer');

    expect(page.textContent).toContain('Larch Lane kitchen');
    expect(page.textContent).toContain('600 × 720 × 560 mm');
    expect(buttonNames()).toContain('Job document');
    expect(buttonNames()).toEqual(expect.arrayContaining(['Download pack', 'Drilling files of Left side']));
    expect(buttonNames()).not.toContain('Send pack…');
    expect(buttonNames().filter((n) => /add panel|details|edit|delete|import|attach/i.test(n))).toEqual([]);
    expect(statusSelects()).toBe(0);
    expect(page.textContent).toContain('Planned');
  });

  it('lets the bench mark panels and nothing more', async () => {
    await openAs('bench');

    expect(statusSelects()).toBe(2);
    expect(buttonNames().filter((n) => /add panel|details|edit|delete/i.test(n))).toEqual([]);
  });

  it('gives a designer every panel control', async () => {
    await openAs('designer');

    expect(buttonNames()).toEqual(
      expect.arrayContaining(['Details', 'Add panel', 'Import cut list', 'Edit Left side', 'Delete Left side', 'Send pack…', 'Attach photo or PDF']),
    );
    expect(statusSelects()).toBe(2);
  });

  it('asks before deleting, naming the panel, and offers a reload when the panel changed meanwhile', async () => {
    await openAs('designer');
    buttonNamed('Delete Left side')!.click();
    await settle();

    expect(overlay().textContent).toContain('Delete panel “Left side”?');
    buttonNamed('Delete panel')!.click();
    await settle();
    http
      .expectOne({ method: 'DELETE', url: '/api/panels/101?version=4' })
      .flush({ error: { code: 'stale-version', message: 'Changed.' } }, { status: 409, statusText: 'Conflict' });
    await settle();

    expect(overlay().textContent).toContain('Someone else changed this panel since you opened it.');
    buttonNamed('Reload')!.click();
    await settle();
    http.expectOne({ method: 'GET', url: '/api/jobs/11' }).flush(aJobDetail());
  });

  it('sends nothing when the delete is cancelled', async () => {
    await openAs('designer');
    buttonNamed('Delete Door')!.click();
    await settle();

    buttonNamed('Cancel')!.click();
    await settle();
    http.expectNone({ method: 'DELETE' });
  });

  it('names the errors and asks before downloading the pack of a job with errors', async () => {
    const finding = { code: 'bores-overlap', severity: 'error', message: 'Two bores overlap.', panel: 'b1-side-left', bores: ['a', 'b'], placements: [], fixes: [] };
    await openAs('bench', { errors: 1, warnings: 0, notes: 0, findings: [finding] });
    expect(page.textContent).toContain('The checks found 1 error.');
    // The finding is listed under the verdict, its panel a link into the editor with the bores it concerns.
    const link = page.querySelector<HTMLAnchorElement>('bw-job-findings a');
    expect(link?.textContent).toBe('Left side');
    expect(link?.getAttribute('href')).toBe('/jobs/11/panels/101?bores=a,b');
    expect(page.querySelector('bw-panel-table')?.textContent).toContain('1 error');

    buttonNamed('Download pack')!.click();
    await settle();
    expect(overlay().textContent).toContain('This job has 1 error');
    buttonNamed('Cancel')!.click();
    await settle();
    http.expectNone((r) => r.url === '/api/jobs/11/pack.zip');

    buttonNamed('Download pack')!.click();
    await settle();
    buttonNamed('Download anyway')!.click();
    await settle();
    // The download carries a progress ticket beside the paper (pack-download-store.ts).
    http.expectOne((r) => r.url === '/api/jobs/11/pack.zip' && r.params.get('paper') === 'a4' && r.params.has('progress'));
    expect(page.textContent).toContain('Making the pack…');
  });

  it("says the labels are on their way when the Labels link starts their download, for a viewer too", async () => {
    await openAs('viewer');
    const labels = [...page.querySelectorAll<HTMLAnchorElement>('a')].find((a) => accessibleName(a) === 'Labels');
    expect(labels?.getAttribute('href')).toBe('/api/jobs/11/labels.pdf');
    expect(labels?.hasAttribute('download')).toBe(true);
    // The browser's own download is not what this test is about: keep the page where it is.
    labels!.addEventListener('click', (event) => event.preventDefault());
    labels!.click();
    await settle();
    expect(overlay().textContent).toContain('Labels for 2 panels, 14 to an A4 sheet: the PDF is on its way to your downloads.');
  });
});

