import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { CatalogEntry } from '../../../shared/api/catalog-contract';
import type { Role } from '../../../shared/api/contract';
import { builtinCatalog } from '../../../shared/catalog/builtin-catalog';
import { fitting } from '../../../shared/catalog/fitting';
import { shopHinge } from '../../../shared/testing/shop-fitting';
import { accessibleName, buttonNamed, settle, signInAs } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { CatalogPage } from './catalog-page';

const shopEntry: CatalogEntry = { fitting: fitting.parse(shopHinge()), origin: 'shop', imported: { by: 'Ruth Greyfield', at: '2026-12-02T09:00:00.000Z' } };
const entries: CatalogEntry[] = [...[...builtinCatalog().values()].map((f): CatalogEntry => ({ fitting: f, origin: 'built-in' })), shopEntry];

describe('CatalogPage', () => {
  let fixture: ComponentFixture<CatalogPage>;
  let page: HTMLElement;
  let http: HttpTestingController;

  async function openAs(role: Role): Promise<void> {
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()] });
    http = TestBed.inject(HttpTestingController);
    await signInAs(role);
    fixture = TestBed.createComponent(CatalogPage);
    page = fixture.nativeElement;
    fixture.detectChanges();
    TestBed.tick();
    http.expectOne('/api/catalog').flush({ fittings: entries });
    await settle();
    await fixture.whenStable();
  }

  afterEach(() => http.verify());

  const names = () => [...page.querySelectorAll('.card .name')].map((n) => n.textContent?.trim());
  const search = async (text: string) => {
    const input = page.querySelector<HTMLInputElement>('.search input')!;
    input.value = text;
    input.dispatchEvent(new Event('input'));
    await fixture.whenStable();
  };

  it('shows every fitting with its drawing and family data, and finds them by name or kind', async () => {
    await openAs('viewer');
    expect(names().length).toBe(entries.length);
    const card = [...page.querySelectorAll('.card')].find((c) => c.textContent?.includes('52/5.5'))!;
    expect(card.querySelectorAll('bw-fitting-drawing circle.face-bore').length).toBe(3);
    expect(card.textContent).toContain("Shop's own");
    expect(card.textContent).toContain('3 bores: Ø35 13 deep, 2 × Ø8 11 deep');
    expect(card.textContent).toContain('Cup-boring distance 3 to 7 mm');
    expect(card.textContent).toContain('Imported by Ruth Greyfield, 2 Dec 2026');

    await search('lift');
    expect(names()).toEqual(['Lift mechanism, light (PF 500 to 1300)', 'Lift mechanism, medium (PF 1200 to 2400)', 'Lift mechanism, strong (PF 2200 to 4000)']);
    await search('hinge cup 52');
    expect(names()).toEqual(['Cup hinge, full overlay, 52/5.5']);
    // A viewer reads the catalog and changes nothing.
    expect([...page.querySelectorAll('button')].map(accessibleName).filter((n) => /import|delete/i.test(n))).toEqual([]);
  });

  it('lets the admin delete a shop fitting, and says which jobs still use one it cannot delete', async () => {
    await openAs('admin');
    expect(buttonNamed('Import')).toBeDefined();
    // Only the shop's own fitting can be deleted.
    expect([...page.querySelectorAll('button')].map(accessibleName).filter((n) => n.startsWith('Delete'))).toEqual(['Delete Cup hinge, full overlay, 52/5.5']);

    buttonNamed('Delete Cup hinge, full overlay, 52/5.5')!.click();
    await settle();
    buttonNamed('Delete fitting')!.click();
    await settle();
    http.expectOne({ method: 'DELETE', url: '/api/catalog/fittings/shop-hinge-52' }).flush(
      {
        error: {
          code: 'fitting-in-use',
          message: '"Cup hinge, full overlay, 52/5.5" is still placed in 1 job: Larch Lane kitchen. Remove it from their panels first; nothing was deleted.',
          details: ['Larch Lane kitchen: 4 placements on 2 panels'],
        },
      },
      { status: 409, statusText: 'Conflict' },
    );
    await settle();
    await fixture.whenStable();
    const alert = page.querySelector('[role="alert"]')?.textContent ?? '';
    expect(alert).toContain('is still placed in 1 job: Larch Lane kitchen.');
    expect(alert).toContain('Larch Lane kitchen: 4 placements on 2 panels');
    expect(names()).toContain('Cup hinge, full overlay, 52/5.5');
  });
});
