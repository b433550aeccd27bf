import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { User, userAnswer } from '../../../shared/api/contract';
import { SignUpBody, signUpRequested } from '../../../shared/api/sign-up-contract';
import { AcceptInvitationBody, passwordResetRequested } from '../../../shared/api/team-contract';

/** The public pages behind the links we mail: invitations, password resets and new shops. */
export const invitationUrl = (token: string) => `/api/invitations/${encodeURIComponent(token)}`;
export const passwordResetUrl = (token: string) => `/api/auth/password-reset/${encodeURIComponent(token)}`;
export const signUpUrl = (token: string) => `/api/sign-up/${encodeURIComponent(token)}`;

/** The calls of the pages the mailed links open; every answer is checked against the contract. */
@Injectable({ providedIn: 'root' })
export class MailLinksApi {
  private readonly http = inject(HttpClient);

  /** Makes the member; the server signs them in on the same answer. */
  async acceptInvitation(token: string, body: AcceptInvitationBody): Promise<User> {
    return userAnswer.parse(await firstValueFrom(this.http.post(`${invitationUrl(token)}/accept`, body))).user;
  }

  /** The server's words, the same whether or not the address has an account. */
  async requestPasswordReset(email: string): Promise<string> {
    return passwordResetRequested.parse(await firstValueFrom(this.http.post('/api/auth/password-reset', { email }))).message;
  }

  async resetPassword(token: string, password: string): Promise<void> {
    await firstValueFrom(this.http.post(passwordResetUrl(token), { password }));
  }

  /** The server's words, the same whether the address is new or already has an account. */
  async requestSignUp(body: SignUpBody): Promise<string> {
    return signUpRequested.parse(await firstValueFrom(this.http.post('/api/sign-up', body))).message;
  }

  /** Makes the shop and its admin; the server signs them in on the same answer. */
  async confirmSignUp(token: string): Promise<User> {
    return userAnswer.parse(await firstValueFrom(this.http.post(signUpUrl(token), {}))).user;
  }
}
