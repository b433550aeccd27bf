import { DatePipe, TitleCasePipe } from '@angular/common';
import { Component, inject, signal } from '@angular/core';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { Role, role } from '../../../shared/api/contract';
import { PendingInvitation, ROLE_DUTIES } from '../../../shared/api/team-contract';
import { describeError } from '../core/api-problem';
import { fieldMessage, FieldWording, notBlank, showFieldProblems } from '../core/form-messages';
import { TeamStore } from './team-store';

type InviteField = 'email' | 'role' | 'name';

const wording: Record<InviteField, FieldWording> = {
  email: { label: 'e-mail address' },
  role: { label: 'role' },
  name: { label: 'name' },
};

/** The admin's invitation: an address and a role, and a name for the greeting if known. */
@Component({
  selector: 'bw-invite-form',
  imports: [DatePipe, TitleCasePipe, ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatSelectModule],
  templateUrl: './invite-form.html',
  styleUrl: './invite-form.scss',
})
export class InviteForm {
  private readonly store = inject(TeamStore);
  private readonly fb = inject(NonNullableFormBuilder);

  protected readonly roles = role.options;
  protected readonly duties = ROLE_DUTIES;
  protected readonly form = this.fb.group({
    email: ['', [Validators.required, Validators.email, Validators.maxLength(254)]],
    // The least a new member can be given; the admin raises it on purpose.
    role: ['viewer' as Role, Validators.required],
    name: ['', [Validators.maxLength(200), notBlank]],
  });
  protected readonly sending = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly sent = signal<PendingInvitation | null>(null);

  protected message(field: InviteField): string {
    const control = this.form.controls[field];
    if (field === 'email' && control.hasError('email')) return 'This is not an e-mail address.';
    return fieldMessage(control, wording[field]);
  }

  protected async invite(formDirective: FormGroupDirective): Promise<void> {
    if (this.form.invalid || this.sending()) {
      this.form.markAllAsTouched();
      return;
    }
    this.sending.set(true);
    this.failure.set(null);
    this.sent.set(null);
    const { email, role, name } = this.form.getRawValue();
    try {
      this.sent.set(await this.store.invite({ email: email.trim(), role, ...(name.trim() ? { name: name.trim() } : {}) }));
      // Through the directive, so the cleared fields do not show as "submitted and empty".
      formDirective.resetForm({ email: '', role: 'viewer', name: '' });
    } catch (error) {
      if (!showFieldProblems(this.form, error)) this.failure.set(describeError(error));
    } finally {
      this.sending.set(false);
    }
  }
}
