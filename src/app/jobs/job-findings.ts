import { Component, computed, inject, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import type { PanelRecord } from '../../../shared/api/contract';
import { JobFindingsStore } from './job-findings-store';
import { SEVERITY_ICONS } from '../ui/severity-icons';

/**
 * The findings of the whole job, panel by panel, each a link that opens the editor at its panel with the
 * bores and placements it concerns selected and in view.
 */
@Component({
  selector: 'bw-job-findings',
  imports: [MatIconModule, RouterLink],
  templateUrl: './job-findings.html',
  styleUrl: './job-findings.scss',
})
export class JobFindings {
  private readonly store = inject(JobFindingsStore);
  readonly panels = input.required<readonly PanelRecord[]>();

  protected readonly icons = SEVERITY_ICONS;
  protected readonly rows = computed(() => {
    const panels = new Map(this.panels().map((p) => [p.id, p]));
    return (this.store.value()?.findings ?? []).map((finding) => {
      const panel = panels.get(finding.panel);
      const focus = { bores: finding.bores.join(',') || null, placements: finding.placements.join(',') || null };
      return { finding, panelName: panel?.name ?? finding.panel, dbId: panel?.dbId, focus, hint: finding.fixes[0]?.message ?? finding.advice };
    });
  });
}
