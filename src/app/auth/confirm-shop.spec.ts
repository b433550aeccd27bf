import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';
import { settle } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { ConfirmShop } from './confirm-shop';

const TOKEN = 'a'.repeat(43);

describe('ConfirmShop', () => {
  let fixture: ComponentFixture<ConfirmShop>;
  let http: HttpTestingController;
  let page: HTMLElement;

  afterEach(() => http.verify());

  /** Opens the page with the link's token; the server answers what the link will make. */
  async function answer(status: number, body: object): Promise<void> {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(ConfirmShop);
    fixture.componentRef.setInput('token', TOKEN);
    page = fixture.nativeElement;
    TestBed.tick();
    http.expectOne(`/api/sign-up/${TOKEN}`).flush(body, { status, statusText: String(status) });
    await settle();
    await fixture.whenStable();
  }

  it('shows what the link will make, and makes it only on the button, then opens the jobs', async () => {
    await answer(200, { email: 'mara@example.com', shopName: 'Harrow Bench Works', name: 'Mara Voss', expiresAt: '2026-12-04T10:00:00.000Z' });
    expect(page.querySelector('.shop-name')?.textContent).toBe('Harrow Bench Works');
    http.expectNone({ method: 'POST' });
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
    page.querySelector<HTMLButtonElement>('button')!.click();
    await settle();
    http.expectOne({ method: 'POST', url: `/api/sign-up/${TOKEN}` }).flush({ user: { id: 9, email: 'mara@example.com', name: 'Mara Voss', role: 'admin', units: 'mm' } }, { status: 201, statusText: 'Created' });
    await settle();
    expect(navigate).toHaveBeenCalledWith('/jobs');
  });

  it('says a used link was used, and offers sign-in', async () => {
    await answer(410, { error: { code: 'link-used', message: 'This confirmation link has already been used, and the shop was made then.' } });
    expect(page.querySelector('[role="alert"]')?.textContent).toContain('already been used');
    expect(page.querySelector('a')?.textContent?.trim()).toBe('Sign in');
  });

  it('says an expired link expired, and offers to create the shop again', async () => {
    await answer(410, { error: { code: 'link-expired', message: 'This confirmation link expired at 2026-12-04 10:00 UTC.' } });
    expect(page.querySelector('[role="alert"]')?.textContent).toContain('expired');
    expect(page.querySelector('a')?.textContent?.trim()).toBe('Create a shop again');
  });
});
