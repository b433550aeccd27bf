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
import { fieldMessage, notBlank, showFieldProblems } from '../core/form-messages';
import { MailLinksApi } from './mail-links-api';
import { NewPasswordFields } from './new-password-fields';
import { newPasswordGroup } from './password-rules';

/**
 * A visitor asks for a shop of their own (SIGNUP=open): its name, theirs, their address and a password.
 * The answer is the same for any address, so the page never tells a stranger who has an account; the
 * shop is made when the link mailed to the address is followed (confirm-shop.ts).
 */
@Component({
  selector: 'bw-create-shop',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatCardModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, NewPasswordFields],
  templateUrl: './create-shop.html',
  styleUrls: ['./sign-in.scss', './public-page.scss'],
})
export class CreateShop {
  private readonly api = inject(MailLinksApi);
  private readonly fb = inject(NonNullableFormBuilder);

  protected readonly form = this.fb.group({
    shopName: ['', [Validators.required, Validators.maxLength(200), notBlank]],
    name: ['', [Validators.required, Validators.maxLength(200), notBlank]],
    email: ['', [Validators.required, Validators.email, Validators.maxLength(254)]],
    passwords: newPasswordGroup(this.fb),
  });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  /** The server's answer once asked (naming the address typed): the same words whether or not it has an account. */
  protected readonly asked = signal<string | null>(null);

  protected shopNameMessage(): string {
    const control = this.form.controls.shopName;
    return control.hasError('required') ? 'Enter the name of the shop.' : fieldMessage(control, { label: 'shop name' });
  }

  protected nameMessage(): string {
    const control = this.form.controls.name;
    return control.hasError('required') ? 'Enter your name.' : fieldMessage(control, { label: 'name' });
  }

  protected async ask(): Promise<void> {
    if (this.form.invalid || this.busy()) {
      this.form.markAllAsTouched();
      return;
    }
    this.busy.set(true);
    this.failure.set(null);
    const { shopName, name, email, passwords } = this.form.getRawValue();
    try {
      this.asked.set(await this.api.requestSignUp({ shopName: shopName.trim(), name: name.trim(), email: email.trim(), password: passwords.password }));
    } catch (error) {
      if (error instanceof ApiProblem && error.status === 429) this.failure.set('Too many requests to create a shop from here. Wait an hour, then try again.');
      // The server names `shopName`, `name`, `email` and `password`; the password's control sits in the pair typed twice.
      else if (![showFieldProblems(this.form, error), showFieldProblems(this.form.controls.passwords, error)].some(Boolean)) this.failure.set(describeError(error));
    } finally {
      this.busy.set(false);
    }
  }
}
