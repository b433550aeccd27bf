import { Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatToolbarModule } from '@angular/material/toolbar';
import { Router, RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { AuthStore } from '../auth/auth-store';
import { Can } from '../auth/can';
import { describeError } from '../core/api-problem';
import { LENGTH_UNIT_NAMES, LENGTH_UNITS, type LengthUnit } from '../../../shared/units/length-unit';

/**
 * The frame around every signed-in page: product name, navigation, who is signed in, sign-out.
 * It is in the first download, so it keeps to light widgets (no overlays: no tooltip, no snack bar).
 */
@Component({
  selector: 'bw-shell',
  imports: [Can, MatButtonModule, MatIconModule, MatToolbarModule, RouterLink, RouterLinkActive, RouterOutlet],
  templateUrl: './shell.html',
  styleUrl: './shell.scss',
})
export class Shell {
  private readonly router = inject(Router);
  protected readonly auth = inject(AuthStore);

  /** The phone's list of links, open or folded. */
  protected readonly menuOpen = signal(false);
  protected readonly signingOut = signal(false);
  protected readonly signOutFailure = signal<string | null>(null);
  protected readonly units = LENGTH_UNITS;
  protected readonly unitNames = LENGTH_UNIT_NAMES;
  protected readonly choosingUnits = signal(false);
  protected readonly unitsFailure = signal<string | null>(null);

  protected async chooseUnits(units: LengthUnit): Promise<void> {
    this.choosingUnits.set(true);
    this.unitsFailure.set(null);
    try {
      await this.auth.chooseUnits(units);
    } catch (error) {
      this.unitsFailure.set(`Units not changed: ${describeError(error)}`);
    } finally {
      this.choosingUnits.set(false);
    }
  }

  protected async signOut(): Promise<void> {
    this.signingOut.set(true);
    this.signOutFailure.set(null);
    try {
      await this.auth.signOut();
      await this.router.navigateByUrl('/sign-in');
    } catch (error) {
      this.signOutFailure.set(`Not signed out: ${describeError(error)}`);
    } finally {
      this.signingOut.set(false);
    }
  }
}
