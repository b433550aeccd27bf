import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { OutboxMessage } from '../../../shared/api/pack-contract';
import { errorInterceptor } from '../core/error-interceptor';
import { OutboxPage } from './outbox-page';

const message: OutboxMessage = {
  id: 7,
  at: '2026-12-01T09:30:00.000Z',
  sender: '"Tomas Ward via Borewright" <borewright@localhost>',
  recipients: ['bench@greyfield.example'],
  subject: 'Bench pack: Larch Lane kitchen',
  text: 'Tomas Ward sent you the bench pack.',
  attachments: [{ name: 'Larch Lane kitchen bench pack.zip', contentType: 'application/zip', bytes: 2_400_000 }],
};

describe('OutboxPage', () => {
  let fixture: ComponentFixture<OutboxPage>;
  let page: HTMLElement;
  let http: HttpTestingController;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(OutboxPage);
    page = fixture.nativeElement;
    TestBed.tick();
  });

  afterEach(() => http.verify());

  it('lists each message with its sender, recipients, body and attachment downloads', async () => {
    http.expectOne('/api/outbox').flush({ messages: [message] });
    await fixture.whenStable();

    expect(page.querySelector('.subject')?.textContent).toContain('Bench pack: Larch Lane kitchen');
    expect(page.textContent).toContain('Tomas Ward via Borewright');
    expect(page.textContent).toContain('To bench@greyfield.example');
    expect(page.querySelector('.body')?.textContent).toBe('Tomas Ward sent you the bench pack.');
    const link = page.querySelector<HTMLAnchorElement>('.attachments a')!;
    expect(link.getAttribute('href')).toBe('/api/outbox/7/attachments/0');
    expect(link.textContent).toContain('Larch Lane kitchen bench pack.zip · 2.4 MB');
  });

  it('says when there is no mail, and when the outbox cannot be read', async () => {
    http.expectOne('/api/outbox').flush({ messages: [] });
    await fixture.whenStable();
    expect(page.textContent).toContain('No mail yet.');

    page.querySelector<HTMLButtonElement>('.bw-page-head button')!.click();
    TestBed.tick();
    http.expectOne('/api/outbox').flush({ error: { code: 'forbidden', message: 'The designer role may not manage the team.' } }, { status: 403, statusText: 'Forbidden' });
    await fixture.whenStable();
    expect(page.querySelector('[role="alert"]')?.textContent).toContain('The designer role may not manage the team.');
  });
});
