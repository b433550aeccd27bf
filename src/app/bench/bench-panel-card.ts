import { DatePipe } from '@angular/common';
import { Component, computed, input, output } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { PanelRecord } from '../../../shared/api/contract';
import { faceName } from '../../../shared/export/export-context';
import { PanelStatus } from '../../../shared/model/job-document';
import { statusStep } from '../../../shared/model/panel-status';
import { roleLabels, statusLabels } from '../jobs/panel-labels';
import { hasFaceB, panelFileUrls } from '../packs/pack-api';
import { PanelFindings } from './bench-store';

/** One mark button's state: done (the panel is at or past it), open (it is the next step), or not yet. */
type MarkState = 'done' | 'open' | 'waiting';

/**
 * One panel at the bench: what it is, which face lies up, what the checks found, its files, and two large
 * buttons to mark it drilled and checked, for a tablet worked with dusty hands.
 */
@Component({
  selector: 'bw-bench-panel-card',
  imports: [DatePipe, MatIconModule],
  templateUrl: './bench-panel-card.html',
  styleUrl: './bench-panel-card.scss',
})
export class BenchPanelCard {
  readonly panel = input.required<PanelRecord>();
  readonly carcassName = input.required<string>();
  readonly materialName = input.required<string>();
  readonly findings = input<PanelFindings>();
  readonly canMark = input(false);
  /** A mark of it is on its way to the server. The buttons stay live: a next mark queues behind it. */
  readonly saving = input(false);
  /** A mark made on it waits on this device to be sent: the status shown is the one it will have. */
  readonly waiting = input(false);
  /** Opened from its label: the drilling map is shown in the card. */
  readonly focused = input(false);
  readonly mark = output<PanelStatus>();

  protected readonly roleLabels = roleLabels;
  protected readonly statusLabels = statusLabels;
  protected readonly files = computed(() => panelFileUrls(this.panel().dbId));
  protected readonly faceB = computed(() => hasFaceB(this.panel()));
  protected readonly size = computed(() => {
    const { width, height, thickness } = this.panel();
    return `${width} × ${height} × ${thickness} mm`;
  });
  protected readonly faceUp = computed(() => {
    const name = faceName(this.panel().role, 'A');
    return `Face A up${name ? ` (${name})` : ''}${this.faceB() ? ', then face B' : ''}`;
  });
  protected readonly findingsText = computed(() => {
    const f = this.findings();
    if (!f || f.errors + f.warnings + f.notes === 0) return 'No findings';
    const parts = [f.errors > 0 && `${f.errors} error${f.errors === 1 ? '' : 's'}`, f.warnings > 0 && `${f.warnings} warning${f.warnings === 1 ? '' : 's'}`, f.notes > 0 && `${f.notes} note${f.notes === 1 ? '' : 's'}`];
    return parts.filter(Boolean).join(', ');
  });
  protected readonly findingsLevel = computed(() => {
    const f = this.findings();
    return !f ? 'none' : f.errors > 0 ? 'error' : f.warnings > 0 ? 'warning' : f.notes > 0 ? 'note' : 'none';
  });
  protected readonly drilled = computed(() => this.markState('drilled'));
  protected readonly checked = computed(() => this.markState('checked'));

  private markState(status: 'drilled' | 'checked'): MarkState {
    const current = this.panel().status;
    if (current === status || (status === 'drilled' && current === 'checked')) return 'done';
    return statusStep(current, status).ok ? 'open' : 'waiting';
  }
}
