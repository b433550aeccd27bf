import { ChangeDetectionStrategy, Component, computed, inject, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import type { Finding } from '../../../../shared/checks';
import { editedPanels } from '../../../../shared/checks/apply-fix';
import { findingKey, type Fix } from '../../../../shared/checks/finding';
import type { Box } from '../../../../shared/layout/bore';
import { fixStaysOnPanel } from '../document/commands/apply-finding-fix';
import { itemsArea } from '../document/items-area';
import { selectionOf } from '../document/selection';
import { EditorStore } from '../editor-store';
import { SEVERITY_ICONS } from '../../ui/severity-icons';


/**
 * The shared checks' findings on this panel, worst first; a click selects what they concern, shows it and
 * opens the finding: its fixes are then tried on a copy of the job, and each that passes applies as one
 * undoable step.
 */
@Component({
  changeDetection: ChangeDetectionStrategy.OnPush,
  selector: 'bw-findings-list',
  imports: [MatButtonModule, MatIconModule],
  templateUrl: './findings-list.html',
  styleUrl: './findings-list.scss',
})
export class FindingsList {
  protected readonly store = inject(EditorStore);
  /** The area to show, in mm, when a finding is chosen. */
  readonly showArea = output<Box>();

  protected readonly icons = SEVERITY_ICONS;
  /** The finding the user opened (by what it is about), whose fixes are tried. */
  private readonly opened = signal<string | null>(null);
  protected readonly openedFinding = computed(() => {
    const key = this.opened();
    const finding = key === null ? undefined : this.store.listedFindings().find((f) => findingKey(f) === key);
    return finding && this.store.fixesFor(finding);
  });

  protected isOpen(finding: Finding): boolean {
    return this.opened() === findingKey(finding);
  }
  protected readonly counts = computed(() => {
    const findings = this.store.listedFindings();
    return { error: findings.filter((f) => f.severity === 'error').length, warning: findings.filter((f) => f.severity === 'warning').length };
  });

  protected staysOnPanel(fix: Fix): boolean {
    const panel = this.store.panel();
    return panel !== undefined && fixStaysOnPanel(fix, panel.id);
  }

  /** The other panels a fix edits, as the job names them. */
  protected otherPanels(fix: Fix): string {
    const here = this.store.panel()?.id;
    return [...new Set(editedPanels(fix))].filter((id) => id !== here).join(', ');
  }

  protected showFinding(finding: Finding): void {
    const panel = this.store.panel();
    const layout = this.store.layout();
    if (!panel || !layout) return;
    this.opened.set(findingKey(finding));
    const loose = new Set(panel.bores.map((b) => b.id));
    this.store.select(selectionOf(finding.placements, finding.bores.filter((id) => loose.has(id))));
    const area = itemsArea(panel, layout, finding.bores, finding.placements);
    if (area) this.showArea.emit(area);
  }
}
