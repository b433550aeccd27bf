import type { PanelSwap, SwapVerdict } from './swap-report';

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** A verdict as a label. */
export const VERDICT_LABEL: Readonly<Record<SwapVerdict, string>> = { fine: 'fine', 'to-drill': 'to drill', 'to-remake': 'to remake' };

/**
 * What a panel comes to, in words the screen and the command line share: a panel not drilled yet gets the
 * new plan whatever its holes would say; a drilled one is told what to do and why.
 */
export function verdictText(p: PanelSwap): string {
  if (!p.drilled) return `not drilled yet: it simply gets the new plan (drilled, it would be ${VERDICT_LABEL[p.verdict]})`;
  if (p.verdict === 'fine') return 'fine: every hole the new fitting needs is there';
  if (p.verdict === 'to-drill') return `to drill: ${plural(p.new.length, 'new hole')}, none in the way of an existing one`;
  const visible = p.unused.filter((u) => u.visible).length;
  const why = [
    p.clashing.length > 0 ? `${plural(p.clashing.length, 'new hole')} cannot be drilled for an existing one in the way` : '',
    visible > 0 ? `${plural(visible, 'old hole')} would show on a visible face` : '',
  ];
  return `to remake: ${why.filter(Boolean).join(', and ')}`;
}
