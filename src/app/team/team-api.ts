import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import {
  InvitationBody,
  MemberUpdate,
  pendingInvitation,
  PendingInvitation,
  teamMember,
  TeamMember,
} from '../../../shared/api/team-contract';

export const teamUrl = '/api/team';

/** The changes the team page sends; every answer is checked against the contract's schema. */
@Injectable({ providedIn: 'root' })
export class TeamApi {
  private readonly http = inject(HttpClient);

  async invite(body: InvitationBody): Promise<PendingInvitation> {
    return pendingInvitation.parse(await firstValueFrom(this.http.post(`${teamUrl}/invitations`, body)));
  }

  async withdraw(invitationId: number): Promise<void> {
    await firstValueFrom(this.http.delete(`${teamUrl}/invitations/${invitationId}`));
  }

  async changeMember(userId: number, changes: MemberUpdate): Promise<TeamMember> {
    return teamMember.parse(await firstValueFrom(this.http.patch(`${teamUrl}/members/${userId}`, changes)));
  }
}
