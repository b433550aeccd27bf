import { Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule } from '@angular/material/dialog';
import { firstValueFrom } from 'rxjs';

export interface ConfirmRequest {
  title: string;
  message: string;
  /** The verb on the confirming button, e.g. "Delete panel". */
  confirmLabel: string;
}

/** Asks before something that cannot be undone. */
@Component({
  selector: 'bw-confirm-dialog',
  imports: [MatButtonModule, MatDialogModule],
  templateUrl: './confirm-dialog.html',
  styleUrl: './confirm-dialog.scss',
})
export class ConfirmDialog {
  protected readonly request = inject<ConfirmRequest>(MAT_DIALOG_DATA);

  /** Resolves true only when the user confirms; closing the dialog any other way means no. */
  static async ask(dialog: MatDialog, request: ConfirmRequest): Promise<boolean> {
    const ref = dialog.open<ConfirmDialog, ConfirmRequest, boolean>(ConfirmDialog, {
      data: request,
      width: '420px',
      maxWidth: 'calc(100vw - 32px)',
      role: 'alertdialog',
    });
    return (await firstValueFrom(ref.afterClosed())) === true;
  }
}
