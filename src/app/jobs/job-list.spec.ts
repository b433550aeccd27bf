import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';
import { Role } from '../../../shared/api/contract';
import { aJobSummary, buttonNamed, settle, signInAs } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { JobList } from './job-list';

const jobs = [
  aJobSummary(),
  aJobSummary({ id: 12, name: 'Loft study bookcase', client: 'R. Lindqvist', panelCount: 16, updatedAt: '2026-11-29T08:00:00.000Z' }),
  aJobSummary({ id: 13, name: 'Clinic storage wall', client: null, panelCount: 9, updatedAt: '2026-12-01T08:00:00.000Z' }),
];

describe('JobList', () => {
  let fixture: ComponentFixture<JobList>;
  let http: HttpTestingController;
  let page: HTMLElement;

  async function openAs(role: Role): Promise<void> {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpTestingController);
    await signInAs(role);
    fixture = TestBed.createComponent(JobList);
    page = fixture.nativeElement;
    // The list's request keeps the page unstable until it is answered.
    fixture.detectChanges();
    http.expectOne('/api/jobs?archived=false').flush({ jobs });
    await settle();
    await fixture.whenStable();
  }

  const rowNames = () => [...page.querySelectorAll('tr.mat-mdc-row td:first-child')].map((td) => td.textContent?.trim());
  const overlay = () => document.querySelector('.cdk-overlay-container') as HTMLElement;

  afterEach(() => http.verify());

  it('lists the newest job first and filters by name or client', async () => {
    await openAs('viewer');
    expect(rowNames()).toEqual(['Clinic storage wall', 'Larch Lane kitchen', 'Loft study bookcase']);

    const filter = page.querySelector<HTMLInputElement>('.filter input')!;
    filter.value = 'lindq';
    filter.dispatchEvent(new Event('input'));
    await fixture.whenStable();
    expect(rowNames()).toEqual(['Loft study bookcase']);

    filter.value = 'porch';
    filter.dispatchEvent(new Event('input'));
    await fixture.whenStable();
    expect(page.textContent).toContain('No job matches “porch”.');
  });

  it('lists the archived jobs instead when asked', async () => {
    await openAs('viewer');
    buttonNamed('Archived')!.click();
    TestBed.tick();
    http.expectOne('/api/jobs?archived=true').flush({ jobs: [] });
    await settle();
    await fixture.whenStable();

    expect(page.textContent).toContain('No archived jobs.');
  });

  it('shows a viewer no control to create, import, rename or archive', async () => {
    await openAs('viewer');

    expect(buttonNamed('New job')).toBeUndefined();
    expect(buttonNamed('Import')).toBeUndefined();
    expect(page.querySelectorAll('[aria-label^="Actions for"]').length).toBe(0);
  });

  it('gives a designer create, import and a menu per job', async () => {
    await openAs('designer');

    expect(buttonNamed('New job')).toBeDefined();
    expect(buttonNamed('Import')).toBeDefined();
    expect(page.querySelectorAll('[aria-label^="Actions for"]').length).toBe(3);
  });

  it('creates a job after field-level checks and offers to open it', async () => {
    await openAs('designer');
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
    buttonNamed('New job')!.click();
    await settle();

    buttonNamed('Create')!.click();
    await settle();
    expect(overlay().querySelector('mat-error')?.textContent?.trim()).toBe('Enter the job name.');

    const name = overlay().querySelector<HTMLInputElement>('input[formControlName="name"]')!;
    name.value = 'Boot room bench';
    name.dispatchEvent(new Event('input'));
    buttonNamed('Create')!.click();
    await settle();
    const post = http.expectOne({ method: 'POST', url: '/api/jobs' });
    expect(post.request.body).toEqual({ name: 'Boot room bench', notes: '' });
    post.flush(aJobSummary({ id: 14, name: 'Boot room bench' }), { status: 201, statusText: 'Created' });
    await settle();

    TestBed.tick();
    http.expectOne('/api/jobs?archived=false').flush({ jobs: [...jobs, aJobSummary({ id: 14, name: 'Boot room bench' })] });
    await fixture.whenStable();
    expect(rowNames()).toContain('Boot room bench');
    expect(navigate).not.toHaveBeenCalled();

    buttonNamed('Open')!.click();
    expect(navigate).toHaveBeenCalledWith(['/jobs', 14]);
  });
});
