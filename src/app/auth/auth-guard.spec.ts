import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { aUser, settle } from '../../testing/fixtures';
import { authGuard } from './auth-guard';

@Component({ selector: 'bw-jobs-stub', template: 'jobs page' })
class JobsStub {}

@Component({ selector: 'bw-sign-in-stub', template: 'sign-in page' })
class SignInStub {}

describe('authGuard', () => {
  let http: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([
          { path: 'sign-in', component: SignInStub },
          { path: 'jobs/:jobId', component: JobsStub, canActivate: [authGuard] },
        ]),
      ],
    });
    http = TestBed.inject(HttpTestingController);
  });

  afterEach(() => http.verify());

  it('lets a signed-in user through', async () => {
    const harness = await RouterTestingHarness.create();
    const navigating = harness.navigateByUrl('/jobs/11');
    await settle();
    http.expectOne('/api/auth/session').flush({ user: aUser('viewer') });
    await navigating;

    expect(TestBed.inject(Router).url).toBe('/jobs/11');
    expect(harness.routeNativeElement?.textContent).toContain('jobs page');
  });

  it('sends everyone else to sign-in, remembering where they were going', async () => {
    const harness = await RouterTestingHarness.create();
    const navigating = harness.navigateByUrl('/jobs/11');
    await settle();
    http.expectOne('/api/auth/session').flush({ user: null });
    await navigating;

    expect(TestBed.inject(Router).url).toBe('/sign-in?returnUrl=%2Fjobs%2F11');
    expect(harness.routeNativeElement?.textContent).toContain('sign-in page');
  });
});
