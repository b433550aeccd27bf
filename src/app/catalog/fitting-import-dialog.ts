import { Component, computed, effect, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { map } from 'rxjs';
import type { CatalogEntry } from '../../../shared/api/catalog-contract';
import { PURPOSE_STYLES } from '../../../shared/export/palette';
import { ApiProblem, describeError } from '../core/api-problem';
import { CatalogStore } from './catalog-store';
import { FittingDrawing } from './fitting-drawing';
import {
  boreGroup,
  EDGES,
  faceBoreIds,
  fittingForm,
  fittingFromForm,
  fittingProblems,
  keepOutGroup,
  OVERLAYS,
  problemText,
  PURPOSES,
  showServerProblems,
} from './fitting-form';
import { FittingUploadStore } from './fitting-upload-store';
import { UploadProblem } from '../ui/upload-problem';
import { UploadStatus } from '../ui/upload-status';

/** A catalog file as the upload tab shows it: the smallest fitting there is, a shelf pin. */
const EXAMPLE = `{
  "fittings": [
    {
      "id": "shop-pin-5",
      "name": "Shelf pin, Ø5, brass",
      "purpose": "shelf-pin",
      "onSystemRow": true,
      "bores": [
        { "id": "pin", "kind": "face", "x": 0, "y": 0,
          "diameter": 5, "depth": "system",
          "source": "the maker's data sheet" }
      ]
    }
  ]
}`;

/**
 * Imports the shop's own fittings (design.md §4), the admin's job: a JSON file (one fitting or a catalog
 * file), or one fitting filled in field by field with its drawing following the form. The catalog's own
 * schema checks the form as it is typed, so each problem shows beside its field, in the words the server
 * would use; the dialog closes with the fittings added.
 */
@Component({
  selector: 'bw-fitting-import-dialog',
  imports: [
    FittingDrawing,
    MatButtonModule,
    MatButtonToggleModule,
    MatCheckboxModule,
    MatDialogModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
    ReactiveFormsModule,
    UploadProblem,
    UploadStatus,
  ],
  providers: [FittingUploadStore],
  templateUrl: './fitting-import-dialog.html',
  styleUrl: './fitting-import-dialog.scss',
})
export class FittingImportDialog {
  private readonly dialogRef = inject<MatDialogRef<FittingImportDialog, CatalogEntry[]>>(MatDialogRef);
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly catalog = inject(CatalogStore);
  protected readonly upload = inject(FittingUploadStore);

  protected readonly example = EXAMPLE;
  protected readonly purposes = PURPOSES.map((purpose) => ({ purpose, ...PURPOSE_STYLES[purpose] }));
  protected readonly overlays = OVERLAYS;
  protected readonly edges = EDGES;
  protected readonly boreNumbers = [
    { key: 'x', label: 'x' },
    { key: 'y', label: 'y' },
    { key: 'diameter', label: 'Diameter' },
  ] as const;

  protected readonly form = fittingForm(this.fb);
  private readonly value = toSignal(this.form.valueChanges.pipe(map(() => this.form.getRawValue())), { initialValue: this.form.getRawValue() });
  /** What the form would import, drawn live whatever its state. */
  protected readonly candidate = computed(() => fittingFromForm(this.value()));
  protected readonly problems = computed(() => fittingProblems(this.candidate()));
  protected readonly cupBores = computed(() => (this.value(), faceBoreIds(this.form.controls.bores)));
  protected readonly cup = computed(() => {
    const { bores, hinge } = this.value();
    const cup = bores.find((b) => b.kind === 'face' && b.id.trim() === hinge.cupBore);
    return cup && cup.diameter !== null ? `The cup: Ø${cup.diameter} mm${cup.depthKind === 'mm' && cup.depth !== null ? `, ${cup.depth} mm deep` : ''}.` : '';
  });
  protected readonly drawingWords = computed(() => {
    const { bores, keepOuts } = this.candidate();
    return `Drawing of the fitting as filled in: ${bores.length} bore${bores.length === 1 ? '' : 's'} and ${keepOuts.length} keep-out${keepOuts.length === 1 ? '' : 's'} around its anchor.`;
  });

  /** The two ways in: field by field, or a file. */
  protected readonly way = signal<'form' | 'file'>('form');
  /** The list of problems shows once an import has been tried; before that, each field speaks when touched. */
  protected readonly tried = signal(false);
  protected readonly saving = signal(false);
  protected readonly failure = signal<{ message: string; details: readonly string[] } | null>(null);

  constructor() {
    effect(() => {
      const state = this.upload.state();
      if (state.step === 'done') this.dialogRef.close(state.fittings);
    });
  }

  /** The message beside a field, by its path in the form. */
  protected problem(...path: (string | number)[]): string {
    return problemText(this.form.get(path));
  }

  protected addBore(): void {
    const taken = new Set(this.form.controls.bores.getRawValue().map((b) => b.id));
    let n = this.form.controls.bores.length + 1;
    while (taken.has(`hole-${n}`)) n++;
    this.form.controls.bores.push(boreGroup(this.fb, `hole-${n}`));
  }

  protected removeBore(index: number): void {
    this.form.controls.bores.removeAt(index);
  }

  protected addKeepOut(): void {
    this.form.controls.keepOuts.push(keepOutGroup(this.fb));
  }

  protected removeKeepOut(index: number): void {
    this.form.controls.keepOuts.removeAt(index);
  }

  protected uploadChosenFile(input: HTMLInputElement): void {
    const file = input.files?.item(0);
    // Cleared so that choosing the same file again after fixing it starts a new upload.
    input.value = '';
    if (file) this.upload.uploadFile(file);
  }

  protected async importForm(): Promise<void> {
    this.tried.set(true);
    this.form.markAllAsTouched();
    if (this.form.invalid || this.saving()) return;
    this.saving.set(true);
    this.failure.set(null);
    try {
      this.dialogRef.close(await this.catalog.importFittings(this.candidate()));
    } catch (error) {
      const fields = error instanceof ApiProblem ? error.fields : {};
      showServerProblems(this.form, fields);
      this.failure.set({ message: describeError(error), details: error instanceof ApiProblem ? error.details : [] });
    } finally {
      this.saving.set(false);
    }
  }

  protected close(): void {
    this.upload.cancel();
    this.dialogRef.close();
  }
}
