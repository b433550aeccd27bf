import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { buttonNamed } from '../../testing/fixtures';
import { RepeatDialog, type RepeatRequest } from './repeat-dialog';

describe('RepeatDialog', () => {
  let fixture: ComponentFixture<RepeatDialog>;
  let page: HTMLElement;
  let close: ReturnType<typeof vi.fn>;

  beforeEach(async () => {
    close = vi.fn();
    // Two plates selected with anchors at y 89.5 and 633.5 on a 722 mm side, 32 mm pitch.
    const request: RepeatRequest = { pitch: 32, lowest: 89.5, highest: 633.5, panelHeight: 722 };
    TestBed.configureTestingModule({
      providers: [
        { provide: MAT_DIALOG_DATA, useValue: request },
        { provide: MatDialogRef, useValue: { close } },
      ],
    });
    fixture = TestBed.createComponent(RepeatDialog);
    page = fixture.nativeElement;
    await fixture.whenStable();
  });

  async function set(label: string, value: string): Promise<void> {
    const field = [...page.querySelectorAll('mat-form-field')].find((f) => f.textContent?.includes(label))!;
    const input = field.querySelector('input')!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    await fixture.whenStable();
  }

  it('lays copies a whole number of pitches apart up the row', async () => {
    await set('Copies', '2');
    // 633.5 + 2 × 32 = 697.5, still on the 722 mm panel.
    expect(page.querySelector('.outcome')?.textContent).toContain('the last copy at y 697.5 mm');
    buttonNamed('Repeat')!.click();
    expect(close).toHaveBeenCalledWith({ count: 2, step: 32 });
  });

  it('refuses copies that would run off the panel and says where the last would land', async () => {
    await set('Copies', '3');
    // 633.5 + 3 × 32 = 729.5 > 722.
    expect(page.querySelector('.outcome')?.textContent).toContain('runs off the panel: the last copy at y 729.5 mm');
    expect(buttonNamed('Repeat')!.disabled).toBe(true);
  });

  it('runs down the row with a negative step', async () => {
    await set('Apart', '2');
    (page.querySelectorAll<HTMLButtonElement>('mat-button-toggle button')[1]).click();
    await fixture.whenStable();
    // 89.5 − 64 = 25.5.
    expect(page.querySelector('.outcome')?.textContent).toContain('the last copy at y 25.5 mm');
    buttonNamed('Repeat')!.click();
    expect(close).toHaveBeenCalledWith({ count: 1, step: -64 });
  });
});
