import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { CutListPreview, CutListRowAnswer } from '../../../shared/api/cut-list-contract';
import { buttonNamed, settle } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { CutListDialog, CutListRequest } from './cut-list-dialog';

/** A row as the server answers it, with its cells as text. */
function aRow(row: number, name: string, errors: string[] = []): CutListRowAnswer {
  return {
    row,
    name,
    width: 540,
    height: 300,
    thickness: 18,
    material: 'pb18',
    quantity: 2,
    role: 'shelf',
    cells: { name, width: '540', height: '300', thickness: '18', material: 'pb18', quantity: '2' },
    errors,
  };
}

describe('CutListDialog', () => {
  let fixture: ComponentFixture<CutListDialog>;
  let page: HTMLElement;
  let http: HttpTestingController;
  let close: ReturnType<typeof vi.fn>;
  const file = new File(['panel name,width\n'], 'kitchen.csv', { type: 'text/csv' });

  beforeEach(async () => {
    close = vi.fn();
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(withInterceptors([errorInterceptor])),
        provideHttpClientTesting(),
        { provide: MAT_DIALOG_DATA, useValue: { jobId: 11 } satisfies CutListRequest },
        { provide: MatDialogRef, useValue: { close } },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(CutListDialog);
    page = fixture.nativeElement;
    await fixture.whenStable();
  });

  afterEach(() => http.verify());

  /** Chooses the file in the hidden picker, as the browser's file dialog would, and answers the preview. */
  async function choose(preview: CutListPreview): Promise<void> {
    const input = page.querySelector<HTMLInputElement>('input[type=file]')!;
    Object.defineProperty(input, 'files', { value: { item: () => file, length: 1 }, configurable: true });
    input.dispatchEvent(new Event('change'));
    const request = http.expectOne('/api/jobs/11/cut-list/preview');
    expect(request.request.method).toBe('POST');
    expect(((request.request.body as FormData).get('file') as File).name).toBe('kitchen.csv');
    request.flush(preview);
    await settle();
    await fixture.whenStable();
  }

  const text = (selector: string) => page.querySelector(selector)?.textContent?.replace(/\s+/g, ' ').trim();

  it('shows each row with its errors marked, sums up, and keeps Confirm disabled while any row has an error', async () => {
    await choose({
      fileName: 'kitchen.csv',
      rows: [aRow(2, 'Shelf'), aRow(3, '=HYPERLINK("http://x","y")'), aRow(4, 'Door', ['thickness: MDF 19 comes in 19 mm only, not 18 mm'])],
      problems: [],
      panelCount: 4,
      rowsWithErrors: 1,
    });

    expect(text('.summary')).toContain('kitchen.csv: 3 rows, 1 with errors, 4 panels would be created.');
    const rows = [...page.querySelectorAll('tbody tr')];
    expect(rows.map((r) => r.classList.contains('row-error'))).toEqual([false, false, true]);
    expect(rows[2].querySelector('.errors')?.textContent).toContain('thickness: MDF 19 comes in 19 mm only, not 18 mm');
    // A formula cell is shown as the text it is.
    expect(rows[1].querySelector('.name')?.textContent).toBe('=HYPERLINK("http://x","y")');
    expect(buttonNamed('Create 4 panels')!.disabled).toBe(true);

    buttonNamed('Create 4 panels')!.click();
    http.expectNone('/api/jobs/11/cut-list');
  });

  it('keeps Confirm disabled for a problem of the whole file', async () => {
    await choose({ fileName: 'kitchen.csv', rows: [aRow(2, 'Shelf')], problems: ['The header has no "quantity" column.'], panelCount: 2, rowsWithErrors: 0 });

    expect(text('.problems')).toBe('The header has no "quantity" column.');
    expect(buttonNamed('Create 2 panels')!.disabled).toBe(true);
  });

  it('imports the same file once every row is good, and closes with what it created', async () => {
    await choose({ fileName: 'kitchen.csv', rows: [aRow(2, 'Shelf'), aRow(3, 'Back')], problems: [], panelCount: 4, rowsWithErrors: 0 });
    const confirm = buttonNamed('Create 4 panels')!;
    expect(confirm.disabled).toBe(false);

    confirm.click();
    await fixture.whenStable();
    const request = http.expectOne('/api/jobs/11/cut-list');
    expect(((request.request.body as FormData).get('file') as File).name).toBe('kitchen.csv');
    expect(text('.progress')).toMatch(/^Uploading kitchen\.csv: 0 %/);
    request.flush({ panelCount: 4 }, { status: 201, statusText: 'Created' });
    await settle();
    await fixture.whenStable();

    expect(close).toHaveBeenCalledWith({ panelCount: 4, fileName: 'kitchen.csv' });
  });

  it('lists every problem when the server refuses the import', async () => {
    await choose({ fileName: 'kitchen.csv', rows: [aRow(2, 'Shelf')], problems: [], panelCount: 2, rowsWithErrors: 0 });
    buttonNamed('Create 2 panels')!.click();
    await fixture.whenStable();
    http.expectOne('/api/jobs/11/cut-list').flush(
      { error: { code: 'invalid-cut-list', message: 'The cut list has errors in 1 of its 1 rows; nothing was imported.', details: ['row 2: material: this job has no material "pb18"'] } },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle();
    await fixture.whenStable();

    expect(text('[role=alert] .bw-alert-text')).toBe('kitchen.csv: The cut list has errors in 1 of its 1 rows; nothing was imported.');
    expect(text('.details')).toBe('row 2: material: this job has no material "pb18"');
    expect(close).not.toHaveBeenCalled();
  });
});
