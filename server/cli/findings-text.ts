import type { Finding } from '../../shared/checks/finding';
import type { JobDocument } from '../../shared/model/job-document';

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** How many findings of each severity. */
export function countFindings(findings: readonly Finding[]): { errors: number; warnings: number; notes: number } {
  const count = (severity: Finding['severity']) => findings.filter((f) => f.severity === severity).length;
  return { errors: count('error'), warnings: count('warning'), notes: count('note') };
}

/** The findings as a bench hand reads them: a summary line, then each panel with findings, in document order. */
export function findingsText(job: JobDocument, findings: readonly Finding[]): string {
  const { errors, warnings, notes } = countFindings(findings);
  const lines = [`${job.name}: ${plural(job.panels.length, 'panel')} checked, ${plural(errors, 'error')}, ${plural(warnings, 'warning')}, ${plural(notes, 'note')}.`];
  if (findings.length === 0) lines.push('', 'No findings: every panel is clear.');
  for (const panel of job.panels) {
    const own = findings.filter((f) => f.panel === panel.id);
    if (own.length === 0) continue;
    lines.push('', `Panel ${panel.id} (${panel.name}, ${panel.role})`);
    for (const f of own) {
      lines.push(`  ${f.severity.padEnd(8)}${f.code.padEnd(19)}${f.message}`);
      const indent = ' '.repeat(2 + 8 + 19);
      for (const fix of f.fixes) lines.push(`${indent}Fix: ${fix.message}`);
      if (f.advice) lines.push(`${indent}${f.advice}`);
    }
  }
  return lines.join('\n');
}
