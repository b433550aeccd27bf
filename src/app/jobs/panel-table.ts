import { DatePipe } from '@angular/common';
import { Component, computed, effect, inject, input, output, signal, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelect, MatSelectModule } from '@angular/material/select';
import { MatSort, MatSortModule } from '@angular/material/sort';
import { MatTableDataSource, MatTableModule } from '@angular/material/table';
import { MatTooltipModule } from '@angular/material/tooltip';
import { Lengths } from '../ui/lengths';
import { RouterLink } from '@angular/router';
import { PanelRecord } from '../../../shared/api/contract';
import { Carcass, Material, PanelStatus, panelStatus } from '../../../shared/model/job-document';
import { statusStep } from '../../../shared/model/panel-status';
import { AuthStore } from '../auth/auth-store';
import { PanelDownloads } from '../packs/panel-downloads';
import { JobFindingsStore } from './job-findings-store';
import { roleLabels, statusLabels } from './panel-labels';

/** A panel with the words the table shows and sorts by. */
interface PanelRow {
  panel: PanelRecord;
  role: string;
  carcass: string;
  material: string;
  size: string;
  status: string;
}

export interface PanelStatusChange {
  panel: PanelRecord;
  status: PanelStatus;
}

const readColumns = ['name', 'role', 'carcass', 'size', 'material', 'findings', 'status', 'files'];

/** A job's panels: sortable, filterable, with the controls the user's role allows. */
@Component({
  selector: 'bw-panel-table',
  imports: [
    DatePipe,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatSelectModule,
    MatSortModule,
    MatTableModule,
    MatTooltipModule,
    PanelDownloads,
    RouterLink,
  ],
  templateUrl: './panel-table.html',
  styleUrl: './panel-table.scss',
})
export class PanelTable {
  protected readonly lengths = inject(Lengths);
  private readonly auth = inject(AuthStore);
  /** Errors and warnings per panel, from the checks of the job on the page. */
  private readonly jobFindings = inject(JobFindingsStore);
  protected readonly findings = this.jobFindings.byPanel;
  protected readonly findingsLoaded = computed(() => this.jobFindings.value() !== undefined);

  readonly panels = input.required<readonly PanelRecord[]>();
  readonly carcasses = input.required<readonly Carcass[]>();
  readonly materials = input.required<readonly Material[]>();
  /** An archived job: its panels are shown, not changed. */
  readonly readOnly = input(false);
  readonly editPanel = output<PanelRecord>();
  readonly deletePanel = output<PanelRecord>();
  readonly changeStatus = output<PanelStatusChange>();
  private readonly sort = viewChild(MatSort);

  protected readonly filter = signal('');
  protected readonly statuses = panelStatus.options.map((status) => ({ status, label: statusLabels[status] }));
  protected readonly canEdit = computed(() => this.auth.can('editJobs') && !this.readOnly());
  protected readonly canMark = computed(() => this.auth.can('markPanels') && !this.readOnly());
  protected readonly columns = computed(() => (this.canEdit() ? [...readColumns, 'actions'] : readColumns));
  protected readonly rows = new MatTableDataSource<PanelRow>([]);
  private readonly panelRows = computed(() => {
    const carcassNames = new Map(this.carcasses().map((c) => [c.id, c.name]));
    const materialNames = new Map(this.materials().map((m) => [m.id, m.name]));
    return this.panels().map(
      (panel): PanelRow => ({
        panel,
        role: roleLabels[panel.role],
        carcass: panel.carcass === undefined ? '—' : (carcassNames.get(panel.carcass) ?? panel.carcass),
        material: materialNames.get(panel.material) ?? panel.material,
        size: this.lengths.figures(panel.width, panel.height, panel.thickness),
        status: statusLabels[panel.status],
      }),
    );
  });

  constructor() {
    this.rows.filterPredicate = (row, text) =>
      [row.panel.name, row.role, row.carcass, row.material, row.size, row.status]
        .join(' ')
        .toLowerCase()
        .includes(text);
    this.rows.sortingDataAccessor = (row, column) => sortKey(row, column);
    effect(() => (this.rows.data = this.panelRows()));
    effect(() => (this.rows.sort = this.sort() ?? null));
    effect(() => (this.rows.filter = this.filter().trim().toLowerCase()));
  }

  /**
   * Asks for a status and shows the panel's own until the server has taken the new one: the saved record
   * then brings it, and a refused change leaves the choice the panel really has.
   */
  protected askStatus(panel: PanelRecord, select: MatSelect, status: PanelStatus): void {
    select.value = panel.status;
    this.changeStatus.emit({ panel, status });
  }

  /** The statuses a panel may go to from its own (shared/model/panel-status.ts); its own stays listed. */
  protected canSet(from: PanelStatus, to: PanelStatus): boolean {
    return from === to || statusStep(from, to).ok;
  }
}

/** Sizes sort by area, so a large door comes after a small shelf whichever way it is turned. */
function sortKey(row: PanelRow, column: string): string | number {
  if (column === 'name') return row.panel.name.toLocaleLowerCase();
  if (column === 'size') return row.panel.width * row.panel.height;
  if (column === 'status') return panelStatus.options.indexOf(row.panel.status);
  if (column === 'role' || column === 'carcass' || column === 'material') return row[column].toLocaleLowerCase();
  return '';
}
