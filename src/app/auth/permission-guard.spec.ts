import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { Role } from '../../../shared/api/contract';
import { signInAs } from '../../testing/fixtures';
import { permissionGuard } from './permission-guard';

@Component({ selector: 'bw-team-stub', template: 'team page' })
class TeamStub {}

@Component({ selector: 'bw-jobs-stub', template: 'jobs page' })
class JobsStub {}

describe('permissionGuard', () => {
  async function visitTeamAs(role: Role): Promise<string> {
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([
          { path: 'jobs', component: JobsStub },
          { path: 'team', component: TeamStub, canActivate: [permissionGuard('manageTeam')] },
        ]),
      ],
    });
    await signInAs(role);
    const harness = await RouterTestingHarness.create();
    await harness.navigateByUrl('/team');
    TestBed.inject(HttpTestingController).verify();
    return TestBed.inject(Router).url;
  }

  it('lets an admin onto the team page', async () => {
    expect(await visitTeamAs('admin')).toBe('/team');
  });

  it('sends any other role to the jobs', async () => {
    expect(await visitTeamAs('designer')).toBe('/jobs');
  });
});
