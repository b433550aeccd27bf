import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { buttonNamed, settle } from '../../testing/fixtures';
import { ApiProblem } from '../core/api-problem';
import { JobFormDialog, JobFormRequest, JobFormValues } from './job-form-dialog';

describe('JobFormDialog', () => {
  let fixture: ComponentFixture<JobFormDialog>;
  let page: HTMLElement;
  let close: ReturnType<typeof vi.fn>;
  let save: ReturnType<typeof vi.fn<(values: JobFormValues) => Promise<unknown>>>;

  async function open(): Promise<void> {
    close = vi.fn();
    save = vi.fn<(values: JobFormValues) => Promise<unknown>>();
    const request: JobFormRequest = { title: 'Job details', saveLabel: 'Save', job: { name: 'Larch Lane kitchen', client: null, notes: '' }, withNotes: true, save };
    TestBed.configureTestingModule({
      providers: [
        { provide: MAT_DIALOG_DATA, useValue: request },
        { provide: MatDialogRef, useValue: { close } },
      ],
    });
    fixture = TestBed.createComponent(JobFormDialog);
    page = fixture.nativeElement;
    await fixture.whenStable();
  }

  async function submit(): Promise<void> {
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await settle();
    await fixture.whenStable();
  }

  it('saves the fields and closes with what the save gave', async () => {
    await open();
    save.mockResolvedValue({ id: 11 });
    await submit();
    expect(save).toHaveBeenCalledWith({ name: 'Larch Lane kitchen', client: null, notes: '' });
    expect(close).toHaveBeenCalledWith({ id: 11 });
  });

  it('tells the user when someone else changed the job, and offers to reload instead of saving over it', async () => {
    await open();
    save.mockRejectedValue(new ApiProblem(409, 'stale-version', 'Someone else changed this job since you loaded it (it is now at version 4).'));
    await submit();

    expect(page.querySelector('[role="alert"]')?.textContent).toContain('Someone else changed this job since you opened it.');
    expect(page.querySelector<HTMLButtonElement>('button[type="submit"]')!.disabled).toBe(true);
    expect(close).not.toHaveBeenCalled();
    buttonNamed('Reload')!.click();
    expect(close).toHaveBeenCalledWith('reload');
  });
});
