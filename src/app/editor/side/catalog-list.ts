import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import type { Fitting } from '../../../../shared/catalog/fitting';
import { PURPOSE_STYLES } from '../../../../shared/export/palette';
import { EditorStore } from '../editor-store';
import { FITTING_DRAG_TYPE } from '../stage/panel-stage';

/** The fittings of the catalog, searchable by name and kind; a click places one, a drag drops one on the panel. */
@Component({
  changeDetection: ChangeDetectionStrategy.OnPush,
  selector: 'bw-catalog-list',
  imports: [MatFormFieldModule, MatIconModule, MatInputModule],
  templateUrl: './catalog-list.html',
  styleUrl: './catalog-list.scss',
})
export class CatalogList {
  private readonly store = inject(EditorStore);

  protected readonly query = signal('');
  protected readonly styles = PURPOSE_STYLES;
  protected readonly fittings = computed(() => {
    const words = this.query().trim().toLowerCase().split(/\s+/).filter(Boolean);
    return [...this.store.catalog().values()].filter((f) => {
      const text = `${f.name} ${PURPOSE_STYLES[f.purpose].label} ${f.id}`.toLowerCase();
      return words.every((w) => text.includes(w));
    });
  });

  /** Click to place: on the front row's first hole for a row fitting, else by the reference edge mid-height; then it snaps. */
  protected placeFitting(fitting: Fitting): void {
    const panel = this.store.panel();
    const grid = this.store.grid();
    if (!panel || !grid) return;
    this.store.placeFitting(fitting.id, { x: grid.setback, y: fitting.onSystemRow ? panel.height / 4 : panel.height / 2 });
  }

  protected startDrag(e: DragEvent, fitting: Fitting): void {
    e.dataTransfer?.setData(FITTING_DRAG_TYPE, fitting.id);
    if (e.dataTransfer) e.dataTransfer.effectAllowed = 'copy';
  }
}
