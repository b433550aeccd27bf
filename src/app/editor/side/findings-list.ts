import { Component, computed, inject, output } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { Finding } from '../../../../shared/checks';
import { planBox, type Box } from '../../../../shared/layout/bore';
import { selectionOf } from '../document/selection';
import { EditorStore } from '../editor-store';
import { hitItems } from '../stage/hit-index';

const ICONS = { error: 'error', warning: 'warning', note: 'info' } as const;

/** The shared checks' findings on this panel, worst first; a click selects what they concern and shows it. */
@Component({
  selector: 'bw-findings-list',
  imports: [MatIconModule],
  templateUrl: './findings-list.html',
  styleUrl: './findings-list.scss',
})
export class FindingsList {
  protected readonly store = inject(EditorStore);
  /** The area to show, in mm, when a finding is chosen. */
  readonly showArea = output<Box>();

  protected readonly icons = ICONS;
  protected readonly counts = computed(() => {
    const findings = this.store.findings();
    return { error: findings.filter((f) => f.severity === 'error').length, warning: findings.filter((f) => f.severity === 'warning').length };
  });

  protected showFinding(finding: Finding): void {
    const panel = this.store.panel();
    const layout = this.store.layout();
    if (!panel || !layout) return;
    const loose = new Set(panel.bores.map((b) => b.id));
    this.store.select(selectionOf(finding.placements, finding.bores.filter((id) => loose.has(id))));
    const ids = new Set(finding.bores);
    const boxes = layout.bores.filter((b) => ids.has(b.id)).map((b) => planBox(b, panel));
    // A finding about whole placements (a keep-out, a plate without its hinge) shows the placements.
    if (boxes.length === 0) boxes.push(...hitItems(panel, layout).filter((h) => h.kind === 'placement' && finding.placements.includes(h.id)).map((h) => h.box));
    if (boxes.length === 0) return;
    this.showArea.emit([
      Math.min(...boxes.map((b) => b[0])),
      Math.min(...boxes.map((b) => b[1])),
      Math.max(...boxes.map((b) => b[2])),
      Math.max(...boxes.map((b) => b[3])),
    ]);
  }
}
