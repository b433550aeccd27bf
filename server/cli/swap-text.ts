import { formatNumber } from '../../shared/checks/wording';
import type { PanelSwap, SwapBore, SwapReport } from '../../shared/swap/swap-report';
import { verdictText } from '../../shared/swap/verdict-text';
import { VISIBLE_FACE_RULE } from '../../shared/swap/visible-face';

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** A hole as the bench reads it: its id, size and where it is, `hinge-1/fix-1 Ø8 × 11, face A x 31 y 64.5`. */
export function holeText(bore: SwapBore): string {
  const depth = bore.kind === 'face' && bore.through ? 'through' : formatNumber(bore.depth);
  const where = bore.kind === 'face' ? `face ${bore.face} x ${formatNumber(bore.x)} y ${formatNumber(bore.y)}` : `edge ${bore.edge} at ${formatNumber(bore.at)} z ${formatNumber(bore.z)}`;
  return `${bore.id} Ø${formatNumber(bore.diameter)} × ${depth}, ${where}`;
}

function panelLines(p: PanelSwap): string[] {
  const lines = [`Panel ${p.panel.id} (${p.panel.name}, ${p.panel.role}), ${p.panel.status}: ${verdictText(p)}`];
  const row = (label: string, text: string) => lines.push(`  ${label.padEnd(9)}${text}`);
  for (const r of p.reused) row('reused', `${holeText(r.bore)}${r.uses === r.bore.id ? '' : ` (the hole of ${r.uses})`}`);
  for (const n of p.new) row('new', `${holeText(n.bore)}${n.deepens ? ` (deepen ${n.deepens})` : ''}`);
  for (const c of p.clashing) {
    row('clash', holeText(c.bore));
    for (const w of c.with) lines.push(`${' '.repeat(11)}${w.message}`);
  }
  for (const u of p.unused) row('unused', `${holeText(u.bore)}${u.visible ? ', shows on a visible face' : ''}`);
  return lines;
}

/** The swap check as a bench hand reads it: the fittings, the summary, each panel's holes, the new findings, the notes. */
export function swapText(jobName: string, report: SwapReport): string {
  const { from, to, summary: s } = report;
  const lines = [
    `Swap check: ${jobName}`,
    `Replacing ${from.name} (${from.id}) by ${to.name} (${to.id})`,
    '',
    `${plural(s.panels, 'panel')} ${s.panels === 1 ? 'uses' : 'use'} it, with ${plural(s.placements, 'placement')}.`,
    `Drilled panels: ${s.fine} fine, ${s.toDrill} to drill, ${s.toRemake} to remake. Not drilled yet: ${s.notDrilled} (they simply get the new plan).`,
    `Holes: ${s.reused} reused as they are, ${s.new} new to drill, ${s.clashing} new that clash with an existing hole, ${s.unused} old left unused (${s.unusedVisible} on a visible face).`,
  ];
  for (const p of report.panels) lines.push('', ...panelLines(p));
  const { added, resolved } = report.findings;
  lines.push('', added.length === 0 ? 'The checks find nothing new after the swap.' : `The checks find ${plural(added.length, 'new finding')} after the swap:`);
  for (const f of added) lines.push(`  ${f.severity.padEnd(8)}${f.code.padEnd(19)}${f.panel}: ${f.message}`);
  if (resolved > 0) lines.push(`${plural(resolved, 'finding')} of before the swap no longer ${resolved === 1 ? 'applies' : 'apply'}.`);
  if (report.notes.length > 0) lines.push('', 'Notes:', ...report.notes.map((n) => `  - ${n}`));
  if (report.panels.length > 0) lines.push('', VISIBLE_FACE_RULE);
  return lines.join('\n');
}
