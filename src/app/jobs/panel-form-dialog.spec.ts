import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { PanelRecord } from '../../../shared/api/contract';
import { aJobDetail, aPanel, buttonNamed, settle } from '../../testing/fixtures';
import { ApiProblem } from '../core/api-problem';
import { PanelFields } from './jobs-api';
import { PanelFormDialog, PanelFormRequest } from './panel-form-dialog';

describe('PanelFormDialog', () => {
  let fixture: ComponentFixture<PanelFormDialog>;
  let page: HTMLElement;
  let close: ReturnType<typeof vi.fn>;
  let save: ReturnType<typeof vi.fn<(fields: PanelFields) => Promise<PanelRecord>>>;

  async function open(panel?: PanelRecord): Promise<void> {
    const { carcasses, materials } = aJobDetail();
    close = vi.fn();
    save = vi.fn<(fields: PanelFields) => Promise<PanelRecord>>();
    const request: PanelFormRequest = { panel, carcasses, materials, save };
    TestBed.configureTestingModule({
      providers: [
        { provide: MAT_DIALOG_DATA, useValue: request },
        { provide: MatDialogRef, useValue: { close } },
      ],
    });
    fixture = TestBed.createComponent(PanelFormDialog);
    page = fixture.nativeElement;
    await fixture.whenStable();
  }

  function type(control: string, value: string): void {
    const input = page.querySelector<HTMLInputElement>(`input[formControlName="${control}"]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  async function submit(): Promise<void> {
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await settle();
    await fixture.whenStable();
  }

  function errorUnder(label: string): string | undefined {
    const field = [...page.querySelectorAll('mat-form-field')].find((f) => f.querySelector('mat-label')?.textContent?.trim() === label);
    return field?.querySelector('mat-error')?.textContent?.trim();
  }

  it('starts a new panel as a side in the first material, in its thickness', async () => {
    await open();

    const thickness = page.querySelector<HTMLInputElement>('input[formControlName="thickness"]')!;
    expect(thickness.value).toBe('18');
    expect(page.textContent).toContain('Particleboard 18 white · 18 mm');
    expect(page.textContent).toContain('Width is x from the reference edge (front edge of carcass parts, hinge edge of doors); height is y from the lower edge.');
  });

  it('says under each field what is wrong, and does not save', async () => {
    await open();
    type('name', '   ');
    type('width', '0');
    type('height', '6500');
    type('thickness', '');
    await submit();

    expect(errorUnder('Name')).toBe('The panel name must not be blank.');
    expect(errorUnder('Width (x)')).toBe('At least 1 mm.');
    expect(errorUnder('Height (y)')).toBe('At most 6000 mm.');
    expect(errorUnder('Thickness (z)')).toBe('Enter the thickness.');
    expect(save).not.toHaveBeenCalled();
  });

  it('saves the edited fields and closes with the saved panel', async () => {
    await open(aPanel());
    const saved = aPanel({ height: 700, version: 5 });
    save.mockResolvedValue(saved);
    type('name', ' Left side ');
    type('height', '700');
    await submit();

    expect(save).toHaveBeenCalledWith({
      name: 'Left side',
      role: 'side',
      carcass: 'b1',
      width: 560,
      height: 700,
      thickness: 18,
      material: 'pb18',
    });
    expect(close).toHaveBeenCalledWith(saved);
  });

  it('tells the user when someone else changed the panel, and offers to reload', async () => {
    await open(aPanel());
    save.mockRejectedValue(new ApiProblem(409, 'stale-version', 'The panel has changed since version 4.'));
    await submit();

    expect(page.querySelector('[role="alert"]')?.textContent).toContain('Someone else changed this panel since you opened it.');
    expect(close).not.toHaveBeenCalled();
    buttonNamed('Reload')!.click();
    expect(close).toHaveBeenCalledWith('reload');
  });

  it('puts the server’s field messages under their fields', async () => {
    await open(aPanel());
    save.mockRejectedValue(new ApiProblem(400, 'invalid-body', 'The panel is not valid.', { width: 'must be at most 2800 mm for this material' }));
    await submit();

    expect(errorUnder('Width (x)')).toBe('The width must be at most 2800 mm for this material.');
    expect(page.querySelector('[role="alert"]')).toBeNull();
  });
});
