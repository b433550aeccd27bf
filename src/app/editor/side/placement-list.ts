import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { Lengths } from '../../ui/lengths';
import { PURPOSE_STYLES } from '../../../../shared/export/palette';
import type { Placement } from '../../../../shared/model/job-document';
import { selectionOf, unionSelection } from '../document/selection';
import { EditorStore } from '../editor-store';

/** Every placement in words, for keyboard and screen-reader users: choosing one selects it on the stage. */
@Component({
  changeDetection: ChangeDetectionStrategy.OnPush,
  selector: 'bw-placement-list',
  templateUrl: './placement-list.html',
  styleUrl: './placement-list.scss',
})
export class PlacementList {
  protected readonly store = inject(EditorStore);
  private readonly lengths = inject(Lengths);

  protected describe(p: Placement): string {
    const fitting = this.store.catalog().get(p.fitting);
    const name = fitting ? `${PURPOSE_STYLES[fitting.purpose].letter} · ${fitting.name}` : `missing fitting “${p.fitting}”`;
    return `${name} · x ${this.lengths.field(p.x)}, y ${this.lengths.field(p.y)}, face ${p.face}, ${p.rotation}°${p.mirrored ? ', mirrored' : ''}`;
  }

  protected choose(p: Placement, adding: boolean): void {
    const one = selectionOf([p.id]);
    this.store.select(adding ? unionSelection(this.store.selection(), one) : one);
  }
}
