import { DatePipe, TitleCasePipe } from '@angular/common';
import { Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelect, MatSelectModule } from '@angular/material/select';
import { MatSlideToggle, MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTableModule } from '@angular/material/table';
import { Router } from '@angular/router';
import { Role, role } from '../../../shared/api/contract';
import { PendingInvitation, TeamMember } from '../../../shared/api/team-contract';
import { AuthStore } from '../auth/auth-store';
import { describeError } from '../core/api-problem';
import { ConfirmDialog } from '../ui/confirm-dialog';
import { InviteForm } from './invite-form';
import { TeamStore } from './team-store';

/** What each role lets its member do (design.md §1), said before a role changes. */
const ROLE_MAY: Record<Role, string> = {
  admin: 'everything, plus the team, roles, shop settings and catalog imports',
  designer: 'create and edit jobs, carcasses, panels and placements, run checks, export and send packs',
  bench: 'read jobs, download and print packs and templates, mark panels drilled or checked',
  viewer: 'read jobs, drawings and cautions, and nothing else',
};

/** The admin's team page: members with their roles and whether they may sign in, and invitations. */
@Component({
  selector: 'bw-team-page',
  imports: [
    DatePipe,
    InviteForm,
    MatButtonModule,
    MatIconModule,
    MatProgressBarModule,
    MatSelectModule,
    MatSlideToggleModule,
    MatTableModule,
    TitleCasePipe,
  ],
  providers: [TeamStore],
  templateUrl: './team-page.html',
  styleUrl: './team-page.scss',
})
export class TeamPage {
  private readonly dialog = inject(MatDialog);
  private readonly router = inject(Router);
  private readonly auth = inject(AuthStore);
  private readonly snackBar = inject(MatSnackBar);
  protected readonly store = inject(TeamStore);

  protected readonly roles = role.options;
  protected readonly columns = ['member', 'role', 'active', 'since'];
  /** While a change is on its way, the other controls wait for the server's answer. */
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);

  protected isSelf(member: TeamMember): boolean {
    return member.id === this.auth.user()?.id;
  }

  protected async changeRole(member: TeamMember, select: MatSelect, next: Role): Promise<void> {
    const giveUp = () => {
      select.value = member.role;
    };
    const self = this.isSelf(member) && next !== 'admin';
    const confirmed = await ConfirmDialog.ask(
      this.dialog,
      self
        ? {
            title: 'Give up your admin role?',
            message: `As ${next} you can no longer manage the team, and this page closes. Another admin can give the role back.`,
            confirmLabel: `Make me ${next}`,
          }
        : {
            title: `Make ${member.name} ${article(next)} ${next}?`,
            message: `As ${next}, ${member.name} may ${ROLE_MAY[next]}. It applies from their next page.`,
            confirmLabel: `Make ${next}`,
          },
    );
    if (!confirmed) return giveUp();
    const changed = await this.change(member, { role: next }, `${member.name}'s role was not changed.`);
    if (!changed) return giveUp();
    this.snackBar.open(`${member.name} is now ${article(next)} ${next}.`, undefined, { duration: 5000 });
    if (this.isSelf(member) && next !== 'admin') {
      // The toolbar and the permissions follow the new role from the server's own answer.
      this.auth.forgetSession();
      await this.auth.restoreSession();
      await this.router.navigateByUrl('/jobs');
    }
  }

  protected async setActive(member: TeamMember, toggle: MatSlideToggle, active: boolean): Promise<void> {
    const giveUp = () => {
      toggle.checked = member.active;
    };
    if (!active) {
      const confirmed = await ConfirmDialog.ask(this.dialog, {
        title: `Deactivate ${member.name}?`,
        message: `${member.name} is signed out everywhere now and can no longer sign in, nor reset the password. Their name stays on the work they did. You can activate them again later.`,
        confirmLabel: 'Deactivate and sign out',
      });
      if (!confirmed) return giveUp();
    }
    const verb = active ? 'activated' : 'deactivated';
    if (!(await this.change(member, { active }, `${member.name} was not ${verb}.`))) giveUp();
  }

  protected async withdraw(invitation: PendingInvitation): Promise<void> {
    const confirmed = await ConfirmDialog.ask(this.dialog, {
      title: 'Withdraw the invitation?',
      message: `The link mailed to ${invitation.email} stops working. You can invite them again later.`,
      confirmLabel: 'Withdraw',
    });
    if (!confirmed) return;
    await this.run(`The invitation to ${invitation.email} was not withdrawn.`, () => this.store.withdraw(invitation));
  }

  /** An expired invitation goes again with a fresh link; the old one is replaced. */
  protected async sendAgain(invitation: PendingInvitation): Promise<void> {
    await this.run(`The invitation to ${invitation.email} was not sent again.`, () =>
      this.store.invite({ email: invitation.email, role: invitation.role }),
    );
  }

  private change(member: TeamMember, changes: { role?: Role; active?: boolean }, failure: string): Promise<boolean> {
    return this.run(failure, () => this.store.changeMember(member, changes));
  }

  private async run(failure: string, work: () => Promise<unknown>): Promise<boolean> {
    this.busy.set(true);
    this.problem.set(null);
    try {
      await work();
      return true;
    } catch (error) {
      this.problem.set(`${failure} ${describeError(error)}`);
      return false;
    } finally {
      this.busy.set(false);
    }
  }
}

function article(role: Role): string {
  return role === 'admin' ? 'an' : 'a';
}
