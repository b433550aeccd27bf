import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { settle } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { CreateShop } from './create-shop';

describe('CreateShop', () => {
  let fixture: ComponentFixture<CreateShop>;
  let http: HttpTestingController;
  let page: HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(CreateShop);
    page = fixture.nativeElement;
    await fixture.whenStable();
  });

  afterEach(() => http.verify());

  function type(control: string, value: string): void {
    const input = page.querySelector<HTMLInputElement>(`input[formControlName="${control}"]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  function fill(email = ' mara@example.com '): void {
    type('shopName', ' Harrow Bench Works ');
    type('name', 'Mara Voss');
    type('email', email);
    type('password', 'chisels and clamps');
    type('repeat', 'chisels and clamps');
  }

  async function submit(): Promise<void> {
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
  }

  it('says what each empty field needs and sends nothing', async () => {
    await submit();
    const errors = [...page.querySelectorAll('mat-error')].map((e) => e.textContent?.trim());
    expect(errors).toContain('Enter the name of the shop.');
    expect(errors).toContain('Enter your name.');
    expect(errors).toContain('Enter your e-mail address.');
    http.expectNone('/api/sign-up');
  });

  it('sends the trimmed fields and shows the server\'s answer, the same for any address', async () => {
    fill();
    await submit();
    const request = http.expectOne({ method: 'POST', url: '/api/sign-up' });
    expect(request.request.body).toEqual({ shopName: 'Harrow Bench Works', name: 'Mara Voss', email: 'mara@example.com', password: 'chisels and clamps' });
    request.flush({ message: 'Check your mail: a message is on its way to mara@example.com with what to do next.' }, { status: 202, statusText: 'Accepted' });
    await settle();
    await fixture.whenStable();
    expect(page.querySelector('[role="status"]')?.textContent).toContain('Check your mail');
    expect(page.querySelector('form')).toBeNull();
  });

  it('puts the server\'s field messages beside their fields', async () => {
    fill();
    await submit();
    http
      .expectOne('/api/sign-up')
      .flush({ error: { code: 'invalid-body', message: 'The request is not valid.', fields: { shopName: 'must not contain control characters' } } }, { status: 400, statusText: 'Bad Request' });
    await settle();
    await fixture.whenStable();
    expect(page.querySelector('mat-error')?.textContent).toContain('control characters');
  });
});
