import { httpResource } from '@angular/common/http';
import { Component, computed, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import { invitationAnswer, ROLE_DUTIES } from '../../../shared/api/team-contract';
import { ApiProblem, describeError } from '../core/api-problem';
import { fieldMessage, notBlank, showFieldProblems } from '../core/form-messages';
import { AuthStore } from './auth-store';
import { invitationUrl, MailLinksApi } from './mail-links-api';
import { NewPasswordFields } from './new-password-fields';
import { newPasswordGroup } from './password-rules';

/**
 * The page an invitation link opens: what the invitation grants, then a name and a password. An
 * expired, used or withdrawn link says so in plain words, with what to do instead.
 */
@Component({
  selector: 'bw-accept-invitation',
  imports: [
    ReactiveFormsModule,
    RouterLink,
    MatButtonModule,
    MatCardModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    NewPasswordFields,
  ],
  templateUrl: './accept-invitation.html',
  styleUrls: ['./sign-in.scss', './public-page.scss'],
})
export class AcceptInvitation {
  private readonly api = inject(MailLinksApi);
  private readonly auth = inject(AuthStore);
  private readonly router = inject(Router);
  private readonly fb = inject(NonNullableFormBuilder);

  /** From the link's query string. */
  readonly token = input<string>();

  private readonly invitation = httpResource(() => (this.token() ? invitationUrl(this.token()!) : undefined), {
    parse: (raw) => invitationAnswer.parse(raw),
  });
  protected readonly granted = computed(() => (this.invitation.hasValue() ? this.invitation.value() : null));
  protected readonly loading = this.invitation.isLoading;
  /** Why the link does not work, or null while it may. */
  protected readonly deadLink = computed(() => {
    if (!this.token()) return { message: 'This link has no invitation in it. Open the link from the mail again, whole.', signIn: false };
    return this.problemOf(this.invitation.error());
  });
  protected readonly duties = ROLE_DUTIES;

  protected readonly form = this.fb.group({
    name: ['', [Validators.required, Validators.maxLength(200), notBlank]],
    passwords: newPasswordGroup(this.fb),
  });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  /** Set when the link died while the form was open (expired or used meanwhile). */
  private readonly diedWhileOpen = signal<{ message: string; signIn: boolean } | null>(null);
  protected readonly shownProblem = computed(() => this.diedWhileOpen() ?? this.deadLink());

  protected nameMessage(): string {
    const control = this.form.controls.name;
    return control.hasError('required') ? 'Enter your name.' : fieldMessage(control, { label: 'name' });
  }

  protected async accept(): Promise<void> {
    if (this.form.invalid || this.busy()) {
      this.form.markAllAsTouched();
      return;
    }
    this.busy.set(true);
    this.failure.set(null);
    const { name, passwords } = this.form.getRawValue();
    try {
      const user = await this.api.acceptInvitation(this.token()!, { name: name.trim(), password: passwords.password });
      this.auth.adoptSession(user);
      await this.router.navigateByUrl('/jobs');
    } catch (error) {
      const dead = this.problemOf(error);
      if (dead) this.diedWhileOpen.set(dead);
      // The server names `name` and `password`; the password's control sits in the pair typed twice.
      else if (![showFieldProblems(this.form, error), showFieldProblems(this.form.controls.passwords, error)].some(Boolean)) this.failure.set(describeError(error));
    } finally {
      this.busy.set(false);
    }
  }

  /** A dead link's answer (404, 410, or an address that became a member meanwhile) in words; null otherwise. */
  private problemOf(error: unknown): { message: string; signIn: boolean } | null {
    if (!(error instanceof ApiProblem)) return error === undefined ? null : { message: describeError(error), signIn: false };
    if (error.code === 'link-used' || error.code === 'already-member') return { message: error.message, signIn: true };
    if (error.status === 404 || error.status === 410) return { message: error.message, signIn: false };
    return null;
  }
}
