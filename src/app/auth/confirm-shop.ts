import { httpResource } from '@angular/common/http';
import { Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import { signUpLinkAnswer } from '../../../shared/api/sign-up-contract';
import { ApiProblem, describeError } from '../core/api-problem';
import { AuthStore } from './auth-store';
import { MailLinksApi, signUpUrl } from './mail-links-api';

/**
 * The page a new shop's confirmation link opens: what the link will make, and one button that makes it
 * and signs its admin in. Opening the page makes nothing (a mail program may open links to preview
 * them); a used or expired link says so in plain words, with what to do instead.
 */
@Component({
  selector: 'bw-confirm-shop',
  imports: [RouterLink, MatButtonModule, MatCardModule, MatIconModule, MatProgressBarModule],
  templateUrl: './confirm-shop.html',
  styleUrls: ['./sign-in.scss', './public-page.scss'],
})
export class ConfirmShop {
  private readonly api = inject(MailLinksApi);
  private readonly auth = inject(AuthStore);
  private readonly router = inject(Router);

  /** From the link's query string. */
  readonly token = input<string>();

  private readonly link = httpResource(() => (this.token() ? signUpUrl(this.token()!) : undefined), { parse: (raw) => signUpLinkAnswer.parse(raw) });
  protected readonly asked = computed(() => (this.link.hasValue() ? this.link.value() : null));
  protected readonly loading = this.link.isLoading;
  protected readonly busy = signal(false);
  /** Set when the link died while the page was open (used or expired meanwhile, or the address taken). */
  private readonly diedWhileOpen = signal<{ message: string; signIn: boolean } | null>(null);
  protected readonly shownProblem = computed(() => {
    if (!this.token()) return { message: 'This link has no confirmation in it. Open the link from the mail again, whole.', signIn: false };
    return this.diedWhileOpen() ?? this.problemOf(this.link.error());
  });

  protected async confirm(): Promise<void> {
    if (this.busy()) return;
    this.busy.set(true);
    try {
      const user = await this.api.confirmSignUp(this.token()!);
      this.auth.adoptSession(user);
      await this.router.navigateByUrl('/jobs');
    } catch (error) {
      this.diedWhileOpen.set(this.problemOf(error) ?? { message: describeError(error), signIn: false });
    } finally {
      this.busy.set(false);
    }
  }

  /** A dead link's answer (404, 410, or the address taken meanwhile) in words; null otherwise. */
  private problemOf(error: unknown): { message: string; signIn: boolean } | null {
    if (!(error instanceof ApiProblem)) return error === undefined ? null : { message: describeError(error), signIn: false };
    if (error.code === 'link-used' || error.code === 'email-taken') return { message: error.message, signIn: true };
    if (error.status === 404 || error.status === 410) return { message: error.message, signIn: false };
    return null;
  }
}
