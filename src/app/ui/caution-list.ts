import { Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { CAUTION_DEFERRAL, CAUTIONS, type CautionId } from '../../../shared/export/cautions';
import type { IconName } from './icon-name';

const ICONS: Record<CautionId, IconName> = {
  'wall-hung': 'home_repair_service',
  'lift-mechanism': 'compress',
  'tall-unit': 'warning',
  drilling: 'health_and_safety',
};

/**
 * The cautions of design.md §8 that apply where it stands, word for word as on the pack's cover sheet,
 * with what they all defer to. Shown to every role: the installer hangs the unit the designer drew.
 */
@Component({
  selector: 'bw-caution-list',
  imports: [MatIconModule],
  templateUrl: './caution-list.html',
  styleUrl: './caution-list.scss',
})
export class CautionList {
  readonly cautions = input.required<readonly CautionId[]>();

  protected readonly shown = computed(() => this.cautions().map((id) => ({ id, icon: ICONS[id], text: CAUTIONS[id] })));
  protected readonly deferral = CAUTION_DEFERRAL;
}
