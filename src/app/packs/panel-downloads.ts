import { Component, computed, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { MatTooltipModule } from '@angular/material/tooltip';
import { PanelRecord } from '../../../shared/api/contract';
import { hasFaceB, hasHoles, panelFileUrls } from './pack-api';

/**
 * A panel's drilling files behind one button: its maps (face B only when it has bores there), the CNC
 * drawing, its drilling programs by the shop's machine settings (when it has holes) and the template
 * sheets on either paper. The server makes them from the panel as saved.
 */
@Component({
  selector: 'bw-panel-downloads',
  imports: [MatButtonModule, MatIconModule, MatMenuModule, MatTooltipModule],
  template: `
    <button mat-icon-button [matMenuTriggerFor]="files" matTooltip="Drilling files" [attr.aria-label]="'Drilling files of ' + panel().name">
      <mat-icon>file_download</mat-icon>
    </button>
    <mat-menu #files="matMenu">
      @if (unsaved()) {
        <p class="unsaved" role="note">The files show the panel as last saved; save first to include your changes.</p>
      }
      @let u = urls();
      <a mat-menu-item [href]="u.svg('A')" download><mat-icon>image</mat-icon>Drilling map, face A (SVG)</a>
      @if (faceB()) {
        <a mat-menu-item [href]="u.svg('B')" download><mat-icon>flip</mat-icon>Drilling map, face B (SVG)</a>
      }
      <a mat-menu-item [href]="u.dxf" download><mat-icon>architecture</mat-icon>CNC drawing (DXF)</a>
      @if (holes()) {
        <a mat-menu-item [href]="u.programs" download><mat-icon>precision_manufacturing</mat-icon>Drilling programs, G-code (zip)</a>
      }
      <a mat-menu-item [href]="u.pdf('a4')" download><mat-icon>print</mat-icon>Template sheets, A4 (PDF)</a>
      <a mat-menu-item [href]="u.pdf('letter')" download><mat-icon>print</mat-icon>Template sheets, US Letter (PDF)</a>
    </mat-menu>
  `,
  styles: `
    .unsaved {
      max-width: 260px;
      margin: 8px 16px;
      color: var(--mat-sys-error);
      font: var(--mat-sys-body-small);
    }
  `,
})
export class PanelDownloads {
  readonly panel = input.required<PanelRecord>();
  /** True while the editor holds changes the server has not got yet. */
  readonly unsaved = input(false);

  protected readonly urls = computed(() => panelFileUrls(this.panel().dbId));
  protected readonly faceB = computed(() => hasFaceB(this.panel()));
  protected readonly holes = computed(() => hasHoles(this.panel()));
}
