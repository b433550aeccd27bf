import { Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { ApiProblem, describeError } from '../core/api-problem';
import { MailLinksApi } from './mail-links-api';

/**
 * Asks for a password reset link by mail. The answer is the same for any address, so the page never
 * tells a stranger who has an account.
 */
@Component({
  selector: 'bw-forgot-password',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatCardModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule],
  templateUrl: './forgot-password.html',
  styleUrls: ['./sign-in.scss', './public-page.scss'],
})
export class ForgotPassword {
  private readonly api = inject(MailLinksApi);
  private readonly fb = inject(NonNullableFormBuilder);

  protected readonly form = this.fb.group({ email: ['', [Validators.required, Validators.email, Validators.maxLength(254)]] });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  /** The server's answer once asked: the same words whether or not the address has an account. */
  protected readonly asked = signal<{ email: string; message: string } | null>(null);

  protected async ask(): Promise<void> {
    if (this.form.invalid || this.busy()) {
      this.form.markAllAsTouched();
      return;
    }
    this.busy.set(true);
    this.failure.set(null);
    const email = this.form.getRawValue().email.trim();
    try {
      this.asked.set({ email, message: await this.api.requestPasswordReset(email) });
    } catch (error) {
      this.failure.set(
        error instanceof ApiProblem && error.status === 429 ? 'Too many requests for a reset link. Wait an hour, then ask again.' : describeError(error),
      );
    } finally {
      this.busy.set(false);
    }
  }
}
