import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { User, userAnswer } from '../../../shared/api/contract';
import { AcceptInvitationBody, passwordResetRequested } from '../../../shared/api/team-contract';

/** The public pages behind the links we mail: invitations and password resets. */
export const invitationUrl = (token: string) => `/api/invitations/${encodeURIComponent(token)}`;
export const passwordResetUrl = (token: string) => `/api/auth/password-reset/${encodeURIComponent(token)}`;

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
}
