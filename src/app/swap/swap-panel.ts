import { Component, computed, input } from '@angular/core';
import { formatNumber } from '../../../shared/checks/wording';
import type { PanelSwap, SwapBore } from '../../../shared/swap/swap-report';
import { VERDICT_LABEL, verdictText } from '../../../shared/swap/verdict-text';
import { SwapDrawing } from './swap-drawing';

type RowKind = 'reused' | 'new' | 'clash' | 'unused';

interface HoleRow {
  kind: RowKind;
  what: string;
  bore: SwapBore;
  where: string;
  size: string;
  note: string;
  warn: boolean;
}

const ROLE: Record<string, string> = { 'drawer-front': 'drawer front' };

function where(b: SwapBore): string {
  return b.kind === 'face' ? `face ${b.face}, x ${formatNumber(b.x)}, y ${formatNumber(b.y)}` : `edge ${b.edge}, at ${formatNumber(b.at)}, z ${formatNumber(b.z)}`;
}

function size(b: SwapBore): string {
  return `Ø${formatNumber(b.diameter)} × ${b.kind === 'face' && b.through ? 'through' : formatNumber(b.depth)}`;
}

/** One panel of the swap check: what it comes to, a row per hole that changes, and a drawing per swapped placement. */
@Component({
  selector: 'bw-swap-panel',
  imports: [SwapDrawing],
  templateUrl: './swap-panel.html',
  styleUrl: './swap-panel.scss',
})
export class SwapPanel {
  readonly swap = input.required<PanelSwap>();

  protected readonly role = computed(() => ROLE[this.swap().panel.role] ?? this.swap().panel.role);

  /** The verdict's chip and its words, shared with the command line; a panel not drilled yet is a new plan. */
  protected readonly verdict = computed(() => {
    const p = this.swap();
    const text = verdictText(p);
    return { key: p.drilled ? p.verdict : 'planned', label: p.drilled ? VERDICT_LABEL[p.verdict] : 'new plan', text: text.charAt(0).toUpperCase() + text.slice(1) + '.' };
  });

  protected readonly rows = computed<HoleRow[]>(() => {
    const p = this.swap();
    const row = (kind: RowKind, what: string, bore: SwapBore, note: string, warn = false): HoleRow => ({ kind, what, bore, where: where(bore), size: size(bore), note, warn });
    return [
      ...p.reused.map((r) => row('reused', 'Reused', r.bore, r.uses === r.bore.id ? 'the same hole' : `the hole of ${r.uses}`)),
      ...p.new.map((n) => row('new', 'New', n.bore, n.deepens ? `deepen ${n.deepens}` : 'drill')),
      ...p.clashing.map((c) => row('clash', 'Clashes', c.bore, c.with.map((w) => w.message).join(' '), true)),
      ...p.unused.map((u) => row('unused', 'Unused', u.bore, u.visible ? 'shows on a visible face' : 'hidden: not on a visible face', u.visible)),
    ];
  });
}
