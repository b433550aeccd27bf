import { httpResource } from '@angular/common/http';
import { Component, computed, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import { passwordResetAnswer } from '../../../shared/api/team-contract';
import { ApiProblem, describeError } from '../core/api-problem';
import { showFieldProblems } from '../core/form-messages';
import { MailLinksApi, passwordResetUrl } from './mail-links-api';
import { NewPasswordFields } from './new-password-fields';
import { newPasswordGroup } from './password-rules';

/** The page a reset link opens: a new password, typed twice. A used or expired link says so. */
@Component({
  selector: 'bw-reset-password',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatCardModule, MatIconModule, MatProgressBarModule, NewPasswordFields],
  templateUrl: './reset-password.html',
  styleUrls: ['./sign-in.scss', './public-page.scss'],
})
export class ResetPassword {
  private readonly api = inject(MailLinksApi);
  private readonly router = inject(Router);
  private readonly fb = inject(NonNullableFormBuilder);

  /** From the link's query string. */
  readonly token = input<string>();

  private readonly reset = httpResource(() => (this.token() ? passwordResetUrl(this.token()!) : undefined), {
    parse: (raw) => passwordResetAnswer.parse(raw),
  });
  protected readonly account = computed(() => (this.reset.hasValue() ? this.reset.value() : null));
  protected readonly loading = this.reset.isLoading;
  private readonly diedWhileOpen = signal<string | null>(null);
  protected readonly deadLink = computed(() => {
    if (this.diedWhileOpen()) return this.diedWhileOpen();
    if (!this.token()) return 'This link has no reset in it. Open the link from the mail again, whole.';
    const error = this.reset.error();
    return error === undefined ? null : describeError(error);
  });

  protected readonly form = newPasswordGroup(this.fb);
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);

  protected async save(): Promise<void> {
    if (this.form.invalid || this.busy()) {
      this.form.markAllAsTouched();
      return;
    }
    this.busy.set(true);
    this.failure.set(null);
    try {
      await this.api.resetPassword(this.token()!, this.form.getRawValue().password);
      await this.router.navigate(['/sign-in'], { queryParams: { passwordChanged: 'true' } });
    } catch (error) {
      if (error instanceof ApiProblem && (error.status === 404 || error.status === 410)) this.diedWhileOpen.set(error.message);
      else if (!showFieldProblems(this.form, error)) this.failure.set(describeError(error));
    } finally {
      this.busy.set(false);
    }
  }
}
