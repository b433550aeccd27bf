import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { DEFAULT_MACHINE_SETTINGS } from '../../../shared/export/machine-settings';
import { errorInterceptor } from '../core/error-interceptor';
import { MachineSettingsPage } from './machine-settings-page';
import { machineSettingsUrl } from './settings-api';

describe('MachineSettingsPage', () => {
  let fixture: ComponentFixture<MachineSettingsPage>;
  let page: HTMLElement;
  let http: HttpTestingController;

  const input = (group: number, name: string) => page.querySelectorAll<HTMLElement>('.tool')[group].querySelector<HTMLInputElement>(`input[formcontrolname="${name}"]`)!;
  /** Lets the page's awaited requests finish, then renders. */
  const settle = async () => {
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
    fixture.detectChanges();
  };
  const button = (text: string) => [...page.querySelectorAll<HTMLButtonElement>('button')].find((b) => b.textContent?.includes(text))!;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(MachineSettingsPage);
    page = fixture.nativeElement;
    fixture.detectChanges();
    http.expectOne(machineSettingsUrl).flush({ machine: DEFAULT_MACHINE_SETTINGS, updatedAt: null, updatedBy: null });
    await settle();
    // The first render compiles Material's form fields and selects: seconds on a busy machine.
  }, 30_000);

  afterEach(() => http.verify());

  it('shows the settings in force, a row per tool, and the caution', () => {
    expect(page.querySelectorAll('.tool').length).toBe(DEFAULT_MACHINE_SETTINGS.tools.length);
    expect(input(4, 'diameter').value).toBe('35');
    expect(page.textContent).toContain('Prove every new drilling program in the air or on scrap first');
    expect(page.textContent).toContain('The defaults: not saved yet.');
  });

  it('refuses a second tool for the same holes before sending anything, and saves what passes', async () => {
    button('Add a tool').click();
    fixture.detectChanges();
    // The new row is a 5 mm blind bit, as the first row already is.
    page.querySelector('form')!.dispatchEvent(new Event('submit'));
    fixture.detectChanges();
    expect(page.querySelector('[role="alert"]')?.textContent).toContain('A second tool for blind holes of 5 mm');
    http.expectNone(machineSettingsUrl);

    const diameter = input(7, 'diameter');
    diameter.value = '12';
    diameter.dispatchEvent(new Event('input'));
    page.querySelector('form')!.dispatchEvent(new Event('submit'));
    const put = http.expectOne((r) => r.method === 'PUT' && r.url === machineSettingsUrl);
    expect(put.request.body.tools.at(-1)).toEqual({ diameter: 12, through: false, tool: 8, feed: 1500, speed: 4000 });
    put.flush({ machine: put.request.body, updatedAt: '2026-12-03T12:00:00.000Z', updatedBy: 'Ruth Greyfield' });
    await settle();
    expect(page.textContent).toContain('by Ruth Greyfield');
  });
});
