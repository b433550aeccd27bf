import { Component, computed, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { AuthStore } from '../auth/auth-store';
import { CautionList } from '../ui/caution-list';

/** The way through the product in six steps, each saying who does it and where, for a first visit. */
@Component({
  selector: 'bw-how-it-works',
  imports: [CautionList, MatButtonModule, MatIconModule, RouterLink],
  templateUrl: './how-it-works.html',
  styleUrl: './how-it-works.scss',
})
export class HowItWorks {
  private readonly auth = inject(AuthStore);
  protected readonly canEdit = computed(() => this.auth.can('editJobs'));
  protected readonly canMark = computed(() => this.auth.can('markPanels'));
  protected readonly cautions = ['wall-hung', 'lift-mechanism', 'tall-unit', 'drilling'] as const;
}
