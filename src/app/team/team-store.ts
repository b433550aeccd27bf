import { httpResource } from '@angular/common/http';
import { computed, inject, Injectable } from '@angular/core';
import {
  InvitationBody,
  MemberUpdate,
  PendingInvitation,
  teamAnswer,
  TeamAnswer,
  TeamMember,
} from '../../../shared/api/team-contract';
import { describeError } from '../core/api-problem';
import { TeamApi, teamUrl } from './team-api';

const EMPTY: TeamAnswer = { members: [], invitations: [] };

/** The shop's members and open invitations, and the admin's changes to them. */
@Injectable()
export class TeamStore {
  private readonly api = inject(TeamApi);
  private readonly team = httpResource(() => teamUrl, { parse: (raw) => teamAnswer.parse(raw) });

  private readonly current = computed(() => (this.team.hasValue() ? this.team.value() : EMPTY));
  readonly members = computed(() => this.current().members);
  readonly invitations = computed(() => this.current().invitations);
  readonly activeAdmins = computed(() => this.members().filter((m) => m.role === 'admin' && m.active).length);
  readonly loading = this.team.isLoading;
  readonly loadError = computed(() => {
    const error = this.team.error();
    return error === undefined ? null : describeError(error);
  });

  reload(): void {
    this.team.reload();
  }

  /** Sends an invitation; it replaces any earlier one to the same address, here as on the server. */
  async invite(body: InvitationBody): Promise<PendingInvitation> {
    const sent = await this.api.invite(body);
    this.edit((team) => ({ ...team, invitations: [sent, ...team.invitations.filter((i) => i.email !== sent.email)] }));
    return sent;
  }

  async withdraw(invitation: PendingInvitation): Promise<void> {
    await this.api.withdraw(invitation.id);
    this.edit((team) => ({ ...team, invitations: team.invitations.filter((i) => i.id !== invitation.id) }));
  }

  /** Changes a role or whether a member is active; rejects with the server's reason (the last admin, oneself). */
  async changeMember(member: TeamMember, changes: MemberUpdate): Promise<TeamMember> {
    const changed = await this.api.changeMember(member.id, changes);
    this.edit((team) => ({ ...team, members: team.members.map((m) => (m.id === changed.id ? changed : m)) }));
    return changed;
  }

  private edit(change: (team: TeamAnswer) => TeamAnswer): void {
    if (this.team.hasValue()) this.team.set(change(this.team.value()));
    else this.team.reload();
  }
}
