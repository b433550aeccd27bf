import { DatePipe } from '@angular/common';
import { Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import type { CatalogEntry, FittingOrigin } from '../../../shared/api/catalog-contract';
import type { FittingPurpose } from '../../../shared/catalog/fitting';
import { PURPOSE_STYLES } from '../../../shared/export/palette';
import { Can } from '../auth/can';
import { ApiProblem, describeError } from '../core/api-problem';
import { ConfirmDialog } from '../ui/confirm-dialog';
import { CatalogStore } from './catalog-store';
import { boreSummary, familyFacts, keepOutSummary } from './fitting-facts';
import { FittingDrawing } from './fitting-drawing';
import { FittingImportDialog } from './fitting-import-dialog';
import { PURPOSES } from './fitting-form';

/** A fitting as its card shows it. */
interface Card {
  entry: CatalogEntry;
  bores: string;
  keepOuts: string;
  facts: string[];
  words: string;
}

/**
 * The catalog (design.md §6): every fitting with its drawing and its family data, searchable by name and
 * kind, built-in and the shop's own side by side; the admin imports the shop's fittings and deletes those
 * no job uses.
 */
@Component({
  selector: 'bw-catalog-page',
  imports: [
    Can,
    DatePipe,
    FittingDrawing,
    MatButtonModule,
    MatButtonToggleModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
  ],
  templateUrl: './catalog-page.html',
  styleUrl: './catalog-page.scss',
})
export class CatalogPage {
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  protected readonly store = inject(CatalogStore);

  protected readonly styles = PURPOSE_STYLES;
  protected readonly purposes = PURPOSES.map((purpose) => ({ purpose, ...PURPOSE_STYLES[purpose] }));
  protected readonly query = signal('');
  protected readonly purpose = signal<FittingPurpose | 'all'>('all');
  protected readonly origin = signal<FittingOrigin | 'all'>('all');
  protected readonly deleting = signal<string | null>(null);
  protected readonly refusal = signal<{ message: string; details: readonly string[] } | null>(null);

  protected readonly shopCount = computed(() => this.store.entries().filter((e) => e.origin === 'shop').length);
  protected readonly cards = computed((): Card[] => {
    const words = this.query().trim().toLowerCase().split(/\s+/).filter(Boolean);
    const purpose = this.purpose();
    const origin = this.origin();
    return this.store
      .entries()
      .filter((e) => (purpose === 'all' || e.fitting.purpose === purpose) && (origin === 'all' || e.origin === origin))
      .filter((e) => {
        const text = `${e.fitting.name} ${PURPOSE_STYLES[e.fitting.purpose].label} ${e.fitting.id}`.toLowerCase();
        return words.every((w) => text.includes(w));
      })
      .map((entry) => {
        const f = entry.fitting;
        const n = f.bores.length;
        return {
          entry,
          bores: boreSummary(f),
          keepOuts: keepOutSummary(f),
          facts: familyFacts(f),
          words: `Drawing of ${f.name}: ${n} bore${n === 1 ? '' : 's'} and ${f.keepOuts.length} keep-out${f.keepOuts.length === 1 ? '' : 's'} around its anchor.`,
        };
      });
  });

  constructor() {
    // Fresh each visit: another admin may have imported since the catalog was first read.
    this.store.reload();
  }

  protected clearFilters(): void {
    this.query.set('');
    this.purpose.set('all');
    this.origin.set('all');
  }

  protected openImport(): void {
    const ref = this.dialog.open<FittingImportDialog, void, CatalogEntry[]>(FittingImportDialog, {
      width: '1080px',
      maxWidth: 'calc(100vw - 32px)',
      maxHeight: 'calc(100vh - 32px)',
      autoFocus: 'first-tabbable',
    });
    ref.afterClosed().subscribe((added) => {
      if (!added || added.length === 0) return;
      this.refusal.set(null);
      const names = added.map((e) => `“${e.fitting.name}”`).join(', ');
      this.snackBar.open(`Imported ${added.length === 1 ? names : `${added.length} fittings: ${names}`}.`, 'OK', { duration: 8000 });
    });
  }

  protected async delete(entry: CatalogEntry): Promise<void> {
    const { fitting } = entry;
    const sure = await ConfirmDialog.ask(this.dialog, {
      title: `Delete “${fitting.name}”?`,
      message: `The shop's fitting ${fitting.id} leaves the catalog. A fitting still placed on a panel is not deleted; the jobs that use it are named instead.`,
      confirmLabel: 'Delete fitting',
    });
    if (!sure) return;
    this.deleting.set(fitting.id);
    this.refusal.set(null);
    try {
      await this.store.deleteFitting(fitting.id);
      this.snackBar.open(`Deleted “${fitting.name}”.`, 'OK', { duration: 5000 });
    } catch (error) {
      this.refusal.set({ message: describeError(error), details: error instanceof ApiProblem ? error.details : [] });
    } finally {
      this.deleting.set(null);
    }
  }
}
