import { ChangeDetectionStrategy, Component, computed, inject, linkedSignal } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { Face, Rotation } from '../../../../shared/model/job-document';
import { hingeCupWhy } from '../document/hinge-distance';
import { EditorStore } from '../editor-store';
import { Lengths } from '../../ui/lengths';
import { placementFields, readLength, type NumberField } from './placement-fields';

/** The selected placement's position, face, turn and fitting parameters; a change is one undoable step. */
@Component({
  changeDetection: ChangeDetectionStrategy.OnPush,
  selector: 'bw-properties-form',
  imports: [MatButtonToggleModule, MatFormFieldModule, MatInputModule, MatSelectModule],
  templateUrl: './properties-form.html',
  styleUrl: './properties-form.scss',
})
export class PropertiesForm {
  protected readonly store = inject(EditorStore);
  protected readonly lengths = inject(Lengths);

  protected readonly rotations: Rotation[] = [0, 90, 180, 270];
  protected readonly placement = computed(() => {
    const selected = this.store.selectedPlacements();
    return selected.length === 1 ? selected[0] : undefined;
  });
  protected readonly fitting = computed(() => {
    const p = this.placement();
    return p && this.store.catalog().get(p.fitting);
  });
  protected readonly fields = computed(() => {
    const panel = this.store.listedPanel();
    return panel ? placementFields(panel, this.fitting()) : [];
  });
  /** Why a hinge cup stands where it does across the door, in the member's units. */
  protected readonly why = computed(() => {
    const p = this.placement();
    return p && hingeCupWhy(p, this.fitting(), this.lengths.unit());
  });
  /** A selection of several things, counted in words. */
  protected readonly selectedWords = computed(() => {
    const { placements, bores } = this.store.selection();
    const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;
    const what = `${count(placements.size, 'placement', 'placements')} and ${count(bores.size, 'loose bore', 'loose bores')} selected.`;
    return this.store.editable() ? `${what} Move them with the arrow keys or by dragging; choose one alone to edit its numbers.` : `${what} Choose one alone to read its numbers.`;
  });
  /** Messages of refused values, by field; cleared when another placement is selected. */
  protected readonly problems = linkedSignal<Record<string, string>>(() => (this.placement()?.id, {}));

  /** A field's length in mm, or undefined when the placement has none. */
  private valueOf(field: NumberField): number | undefined {
    const p = this.placement();
    if (!p) return undefined;
    return field.param ? p.params?.[field.key] : p[field.key as 'x' | 'y'];
  }

  /** A field's length as its input shows it for editing. */
  protected fieldText(field: NumberField): string {
    const value = this.valueOf(field);
    return value === undefined ? '' : this.lengths.field(value);
  }

  /** A field's length as read-only text with its unit. */
  protected readText(field: NumberField): string {
    const value = this.valueOf(field);
    return value === undefined ? '—' : this.lengths.text(value);
  }

  protected changeNumber(field: NumberField, text: string): void {
    const p = this.placement();
    if (!p) return;
    const read = readLength(text, field, this.lengths.unit());
    if ('message' in read) {
      this.problems.update((m) => ({ ...m, [field.key]: read.message }));
      return;
    }
    this.problems.update(({ [field.key]: _gone, ...rest }) => rest);
    const changes = field.param ? { params: { ...p.params, [field.key]: read.value } } : { [field.key]: read.value };
    this.store.setPlacement(p.id, changes);
  }

  protected changeFace(face: Face): void {
    const p = this.placement();
    if (p) this.store.setPlacement(p.id, { face });
  }

  protected changeRotation(rotation: Rotation): void {
    const p = this.placement();
    if (p) this.store.setPlacement(p.id, { rotation });
  }
}
