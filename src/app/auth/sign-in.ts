import { Component, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import { ApiProblem, describeError } from '../core/api-problem';
import { AuthStore } from './auth-store';

@Component({
  selector: 'bw-sign-in',
  imports: [
    ReactiveFormsModule,
    MatButtonModule,
    MatCardModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    RouterLink,
  ],
  templateUrl: './sign-in.html',
  styleUrl: './sign-in.scss',
})
export class SignIn {
  private readonly auth = inject(AuthStore);
  private readonly router = inject(Router);
  private readonly fb = inject(NonNullableFormBuilder);

  /** Where the guard was sending the user before it asked them to sign in. */
  readonly returnUrl = input<string>();
  /** Set by the reset page after a new password was saved. */
  readonly passwordChanged = input<string>();

  protected readonly form = this.fb.group({
    email: ['', [Validators.required, Validators.email]],
    password: ['', Validators.required],
  });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly passwordShown = signal(false);
  /** Offered only where the server takes sign-ups (SIGNUP=open), as the session answer says. */
  protected readonly signUpOpen = this.auth.signUpOpen;

  protected togglePasswordShown(): void {
    this.passwordShown.update((shown) => !shown);
  }

  protected async signIn(): Promise<void> {
    if (this.form.invalid || this.busy()) {
      this.form.markAllAsTouched();
      return;
    }
    this.busy.set(true);
    this.failure.set(null);
    const { email, password } = this.form.getRawValue();
    try {
      await this.auth.signIn(email.trim(), password);
      await this.router.navigateByUrl(this.safeReturnUrl());
    } catch (error) {
      this.failure.set(signInFailure(error));
    } finally {
      this.busy.set(false);
    }
  }

  /** Only paths inside the app, never another site. */
  private safeReturnUrl(): string {
    const target = this.returnUrl();
    return target?.startsWith('/') && !target.startsWith('//') && !target.startsWith('/sign-in') ? target : '/jobs';
  }
}

function signInFailure(error: unknown): string {
  if (error instanceof ApiProblem && error.status === 401) return 'That e-mail address and password do not match an account.';
  // A 429 says how long to wait: seconds while the server only slows the tries, minutes once it refuses them.
  return describeError(error);
}
