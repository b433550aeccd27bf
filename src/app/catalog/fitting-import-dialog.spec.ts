import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatDialogRef } from '@angular/material/dialog';
import type { CatalogEntry } from '../../../shared/api/catalog-contract';
import { fitting } from '../../../shared/catalog/fitting';
import { shopHinge } from '../../../shared/testing/shop-fitting';
import { settle } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { FittingImportDialog } from './fitting-import-dialog';

describe('FittingImportDialog', () => {
  let fixture: ComponentFixture<FittingImportDialog>;
  let page: HTMLElement;
  let http: HttpTestingController;
  let close: ReturnType<typeof vi.fn>;

  beforeEach(async () => {
    close = vi.fn();
    TestBed.configureTestingModule({
      providers: [provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting(), { provide: MatDialogRef, useValue: { close } }],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(FittingImportDialog);
    page = fixture.nativeElement;
    await fixture.whenStable();
  });

  afterEach(() => http.verify());

  function type(input: HTMLInputElement | HTMLTextAreaElement | undefined, value: string): void {
    input!.value = value;
    input!.dispatchEvent(new Event('input'));
    input!.dispatchEvent(new Event('blur'));
  }

  /** The input of the field with this label, the nth such (bore fields repeat per bore). */
  function field(label: string, nth = 0): HTMLInputElement | undefined {
    const fields = [...page.querySelectorAll('mat-form-field')].filter((f) => f.querySelector('mat-label')?.textContent?.trim() === label);
    return fields[nth]?.querySelector<HTMLInputElement>('input, textarea') ?? undefined;
  }

  function errorUnder(label: string, nth = 0): string | undefined {
    const fields = [...page.querySelectorAll('mat-form-field')].filter((f) => f.querySelector('mat-label')?.textContent?.trim() === label);
    return fields[nth]?.querySelector('mat-error')?.textContent?.trim();
  }

  async function submit(): Promise<void> {
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await settle();
    await fixture.whenStable();
  }

  function button(name: string): HTMLButtonElement {
    return [...page.querySelectorAll('button')].find((b) => b.textContent?.trim().endsWith(name))!;
  }

  /** Fills in the shop's 52/5.5 hinge through the fields, as a user would. */
  async function fillHinge(): Promise<void> {
    type(field('Id'), 'shop-hinge-52');
    type(field('Name'), 'Cup hinge, full overlay, 52/5.5');
    type(field('Where the numbers come from'), 'trade-reference §2: the 52/5.5 pattern (common practice)');
    button('Add bore').click();
    button('Add bore').click();
    await fixture.whenStable();
    const bores = [
      ['cup', 0, 0, 35, 13],
      ['fix-1', 5.5, -26, 8, 11],
      ['fix-2', 5.5, 26, 8, 11],
    ] as const;
    bores.forEach(([id, x, y, d, depth], i) => {
      type(field('Bore id', i), id);
      type(field('x', i), String(x));
      type(field('y', i), String(y));
      type(field('Diameter', i), String(d));
      type(field('Depth', i), String(depth));
    });
    type(field('Cup-boring distance from'), '3');
    type(field('Cup-boring distance to'), '7');
    type(field('Hinge constant K'), '13');
    type(field('Opening angle'), '110');
    await fixture.whenStable();
  }

  it('says beside each field what the catalog’s schema finds wrong, lists every problem by its path, and sends nothing', async () => {
    type(field('Id'), 'Shop Hinge');
    type(field('x'), '0');
    type(field('Diameter'), '0');
    await fixture.whenStable();
    // Touched fields speak at once, before any import is tried.
    expect(errorUnder('Id')).toBe('Must be kebab-case: lower-case letters and digits joined by "-".');
    expect(errorUnder('Diameter')).toBe('Must be greater than 0.');

    await submit();
    expect(errorUnder('Name')).toBe('Must not be empty.');
    expect(errorUnder('y')).toBe('Required.');
    expect(errorUnder('Where the numbers come from')).toBe('Must say where the numbers come from.');
    const list = [...page.querySelectorAll('[aria-label="Problems in the fitting"] li')].map((li) => li.textContent?.trim());
    expect(list).toContain('id: must be kebab-case: lower-case letters and digits joined by "-"');
    expect(list).toContain('bores[0].diameter: must be greater than 0');
    expect(list).toContain('bores[0].y: is required');
    expect(list).toContain('hinge.openingAngle: is required');
    expect(close).not.toHaveBeenCalled();
  });

  it('draws the fitting as it is typed', async () => {
    const circles = () => page.querySelectorAll('bw-fitting-drawing circle.face-bore').length;
    expect(circles()).toBe(0);
    type(field('x'), '0');
    type(field('y'), '0');
    type(field('Diameter'), '35');
    await fixture.whenStable();
    expect(circles()).toBe(1);
    expect(page.querySelector('bw-fitting-drawing circle.face-bore')?.getAttribute('r')).toBe('17.5');
    expect(page.querySelector('bw-fitting-drawing text.label')?.textContent).toBe('cup Ø35');
  });

  it('imports a filled-in hinge as the catalog’s JSON and closes with what the server added', async () => {
    await fillHinge();
    expect(page.querySelector('[aria-label="Problems in the fitting"]')).toBeNull();
    await submit();

    const request = http.expectOne('/api/catalog/fittings');
    expect(request.request.method).toBe('POST');
    const sent = fitting.parse(request.request.body);
    expect(sent.bores.map((b) => [b.id, b.x, b.y, b.diameter])).toEqual([
      ['cup', 0, 0, 35],
      ['fix-1', 5.5, -26, 8],
      ['fix-2', 5.5, 26, 8],
    ]);
    const added: CatalogEntry[] = [{ fitting: fitting.parse(shopHinge()), origin: 'shop', imported: { by: 'Ruth Greyfield', at: '2026-12-02T09:00:00.000Z' } }];
    request.flush({ fittings: added }, { status: 201, statusText: 'Created' });
    await settle();
    // The catalog is read again, so every screen has the new fitting.
    TestBed.tick();
    http.expectOne('/api/catalog').flush({ fittings: added });
    await settle();
    expect(close).toHaveBeenCalledWith(added);
  });

  it('shows beside the id that the catalog already has it, and stays open', async () => {
    await fillHinge();
    type(field('Id'), 'hinge-full-overlay-45');
    await submit();
    const reason = '"hinge-full-overlay-45" is a built-in fitting (Cup hinge, full overlay, 45/9.5); a shop\'s fitting cannot replace it, give it an id of its own';
    http.expectOne('/api/catalog/fittings').flush(
      { error: { code: 'fitting-id-taken', message: `id: ${reason}. Nothing was imported.`, fields: { id: reason }, details: [`id: ${reason}`] } },
      { status: 409, statusText: 'Conflict' },
    );
    await settle();
    await fixture.whenStable();
    expect(errorUnder('Id')).toBe(`${reason.charAt(0).toUpperCase()}${reason.slice(1)}.`);
    expect(page.querySelector('[role="alert"]')?.textContent).toContain('Nothing was imported.');
    expect(close).not.toHaveBeenCalled();
  });
});
