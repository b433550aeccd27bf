import { Component, effect, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { CutListImported } from '../../../shared/api/cut-list-contract';
import { CUT_LIST_MAX_BYTES, CUT_LIST_MAX_ROWS } from '../../../shared/cut-list/cut-list-rules';
import { sizeInWords } from '../../../shared/api/file-size';
import { CutListStore } from './cut-list-store';
import { roleLabels } from './panel-labels';
import { UploadProblem } from '../ui/upload-problem';
import { UploadStatus } from '../ui/upload-status';

export interface CutListRequest {
  jobId: number;
}

/** What the dialog closes with after an import: how many panels it created, from which file. */
export interface CutListResult extends CutListImported {
  fileName: string;
}

/**
 * Imports a cut list: choose a CSV, see every row as the server read it with its errors, and create
 * the panels only when no row has one. Nothing is written until the designer confirms.
 */
@Component({
  selector: 'bw-cut-list-dialog',
  imports: [MatButtonModule, MatDialogModule, MatIconModule, UploadProblem, UploadStatus],
  providers: [CutListStore],
  templateUrl: './cut-list-dialog.html',
  styleUrl: './cut-list-dialog.scss',
})
export class CutListDialog {
  private readonly dialogRef = inject<MatDialogRef<CutListDialog, CutListResult>>(MatDialogRef);
  protected readonly store = inject(CutListStore);
  protected readonly roleLabels = roleLabels;
  protected readonly maxSize = sizeInWords(CUT_LIST_MAX_BYTES);
  protected readonly maxRows = CUT_LIST_MAX_ROWS;

  constructor() {
    this.store.forJob(inject<CutListRequest>(MAT_DIALOG_DATA).jobId);
    effect(() => {
      const state = this.store.state();
      if (state.step === 'done') this.dialogRef.close({ ...state.imported, fileName: state.fileName });
    });
  }

  protected readChosenFile(input: HTMLInputElement): void {
    const file = input.files?.item(0);
    // Cleared so that choosing the same file again after mending it reads it again.
    input.value = '';
    if (file) this.store.readFile(file);
  }

  protected plural(count: number, one: string, many: string): string {
    return `${count} ${count === 1 ? one : many}`;
  }

  protected cancel(): void {
    this.store.cancel();
    this.dialogRef.close();
  }
}
