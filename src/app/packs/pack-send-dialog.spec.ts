import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { provideRouter } from '@angular/router';
import { buttonNamed, settle } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { PackSendDialog, PackSendRequest } from './pack-send-dialog';

describe('PackSendDialog', () => {
  let fixture: ComponentFixture<PackSendDialog>;
  let page: HTMLElement;
  let http: HttpTestingController;
  let close: ReturnType<typeof vi.fn>;

  beforeEach(async () => {
    close = vi.fn();
    const request: PackSendRequest = { jobId: 11, jobName: 'Larch Lane kitchen', paper: 'letter' };
    TestBed.configureTestingModule({
      providers: [
        provideRouter([]),
        provideHttpClient(withInterceptors([errorInterceptor])),
        provideHttpClientTesting(),
        { provide: MAT_DIALOG_DATA, useValue: request },
        { provide: MatDialogRef, useValue: { close } },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(PackSendDialog);
    page = fixture.nativeElement;
    // The shop's people load first: the page is not stable while a request is open.
    TestBed.tick();
    http.expectOne('/api/mail/recipients').flush({ people: [{ name: 'Ines Bakker', email: 'bench@greyfield.example' }] });
    await fixture.whenStable();
  });

  afterEach(() => http.verify());

  async function type(text: string): Promise<void> {
    const input = page.querySelector<HTMLInputElement>('mat-chip-grid input')!;
    input.value = text;
    input.dispatchEvent(new Event('input'));
    input.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', keyCode: 13 }));
    await fixture.whenStable();
  }

  async function send(): Promise<void> {
    buttonNamed('Send')!.click();
    await settle();
    await fixture.whenStable();
  }

  const chips = () => [...page.querySelectorAll('mat-chip-row')].map((c) => c.textContent?.replace('error', '').replace('cancel', '').trim());
  const problem = () => page.querySelector('.problem')?.textContent?.trim();

  it('asks for a recipient before sending anything', async () => {
    await send();

    expect(problem()).toBe('Add at least one recipient.');
    http.expectNone('/api/jobs/11/pack/send');
  });

  it('makes a chip of each address typed, and names the ones that are not addresses', async () => {
    await type('Fitter@Example.com, not-an-address');

    expect(chips()).toEqual(['fitter@example.com', 'not-an-address']);
    expect(problem()).toBe('“not-an-address” is not an e-mail address.');
    await send();
    http.expectNone('/api/jobs/11/pack/send');
  });

  it('sends to the chosen addresses on the chosen paper with the message, and closes with the answer', async () => {
    await type('bench@greyfield.example');
    const message = page.querySelector<HTMLTextAreaElement>('textarea')!;
    message.value = '  For Monday.  ';
    message.dispatchEvent(new Event('input'));
    await send();

    const post = http.expectOne({ method: 'POST', url: '/api/jobs/11/pack/send' });
    expect(post.request.body).toEqual({ to: ['bench@greyfield.example'], paper: 'letter', message: 'For Monday.' });
    const answer = { to: ['bench@greyfield.example'], delivery: 'attached', bytes: 123_456 };
    post.flush(answer);
    await settle();

    expect(close).toHaveBeenCalledWith(answer);
  });

  it("shows the server's word on a refused address under the recipients", async () => {
    await type('a@example.com b@example.com');
    await send();

    http.expectOne('/api/jobs/11/pack/send').flush(
      { error: { code: 'invalid-input', message: 'to[1]: must be an e-mail address', fields: { 'to[1]': 'must be an e-mail address' } } },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle();
    await fixture.whenStable();

    expect(problem()).toBe('“b@example.com” must be an e-mail address.');
    expect(close).not.toHaveBeenCalled();
  });
});
