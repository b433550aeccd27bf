import type { Finding, Severity } from '../checks/finding';
import type { Panel } from '../model/job-document';
import { CAUTION_DEFERRAL, type Caution } from './cautions';
import { text, type Drawing } from './drawing';
import { carcassName, dateText, type ExportContext } from './export-context';
import type { HardwareList } from './hardware-list';
import { PageFlow, type Column } from './page-flow';
import { ERROR_RED, INK, MUTED, PURPOSE_STYLES } from './palette';
import { PAPER, type PaperName } from './paper';
import { lengthText } from './units';

export interface CoverInput {
  ctx: ExportContext;
  paper: PaperName;
  /** The job's findings from shared/checks. */
  findings: readonly Finding[];
  /** Every panel with the number of bores it has, in the document's order. */
  panels: readonly { panel: Panel; bores: number }[];
  hardware: HardwareList;
  cautions: readonly Caution[];
}

/** Findings listed one by one on the cover; the rest are counted. */
const LISTED_FINDINGS = 60;
const SEVERITIES: readonly Severity[] = ['error', 'warning', 'note'];

function count(findings: readonly Finding[], severity: Severity): number {
  return findings.filter((f) => f.severity === severity).length;
}

function findingsSection(flow: PageFlow, findings: readonly Finding[]): void {
  flow.heading('Findings of the checks');
  if (findings.length === 0) {
    flow.paragraph('The checks found nothing to report.', 3.2);
    return;
  }
  flow.paragraph(SEVERITIES.map((s) => `${count(findings, s)} ${s}${count(findings, s) === 1 ? '' : 's'}`).join(', ') + '.', 3.2);
  const byCode = new Map<string, { severity: Severity; count: number; panels: Set<string> }>();
  for (const f of findings) {
    const entry = byCode.get(f.code) ?? { severity: f.severity, count: 0, panels: new Set<string>() };
    entry.count++;
    entry.panels.add(f.panel);
    if (SEVERITIES.indexOf(f.severity) < SEVERITIES.indexOf(entry.severity)) entry.severity = f.severity;
    byCode.set(f.code, entry);
  }
  const codes = [...byCode.entries()].sort((a, b) => SEVERITIES.indexOf(a[1].severity) - SEVERITIES.indexOf(b[1].severity) || a[0].localeCompare(b[0]));
  flow.table(
    [{ title: 'Code', width: 45 }, { title: 'Worst', width: 25 }, { title: 'Count', width: 20 }, { title: 'Panels', width: flow.measure - 90 }],
    codes.map(([code, e]) => [code, e.severity, String(e.count), [...e.panels].join(', ')]),
    codes.map(([, e]) => (e.severity === 'error' ? ERROR_RED : INK)),
  );
  const serious = findings.filter((f) => f.severity !== 'note');
  const listed = serious.slice(0, LISTED_FINDINGS);
  if (listed.length === 0) return;
  flow.gap(3);
  flow.table(
    [{ title: 'Panel', width: 30 }, { title: 'Severity', width: 18 }, { title: 'Finding', width: flow.measure - 48 }],
    listed.map((f) => [f.panel, f.severity, f.message]),
    listed.map((f) => (f.severity === 'error' ? ERROR_RED : INK)),
  );
  if (serious.length > listed.length) flow.paragraph(`And ${serious.length - listed.length} more: run the checks for the full list.`, 3, MUTED);
}

/**
 * The cover sheet of a pack, as pages of the chosen paper: the job; "contains errors" in large type when
 * the checks found errors; the cautions that apply, deferring to the maker's data, local codes and licensed
 * professionals; the findings summary; the panels with their status; and the hardware list.
 */
export function coverSheet(input: CoverInput): Drawing[] {
  const { ctx, findings } = input;
  const { width, height } = PAPER[input.paper];
  const flow = new PageFlow(width, height, 15);
  const { job } = ctx;
  flow.place([text(0, 7, 'Bench pack', 7, INK)], 10);
  flow.paragraph(job.name, 5.5);
  if (job.client) flow.paragraph(`Client: ${job.client}`, 3.4);
  flow.paragraph(`Made ${dateText(ctx.date)} by ${ctx.generator.name} ${ctx.generator.version}. ${job.panels.length} panels in ${job.carcasses.length} carcasses. Templates on ${PAPER[input.paper].name}.`, 3.2, MUTED);

  const errors = count(findings, 'error');
  if (errors > 0) {
    flow.gap(3);
    flow.place(
      [
        { kind: 'rect', x: 0, y: 0, width: flow.measure, height: 30, stroke: { color: ERROR_RED, width: 1.2 } },
        text(flow.measure / 2, 16, 'CONTAINS ERRORS', 13, ERROR_RED, 'middle'),
        text(flow.measure / 2, 25, `The checks found ${errors} error${errors === 1 ? '' : 's'}: see the findings. Fix them before drilling.`, 3.6, ERROR_RED, 'middle'),
      ],
      33,
    );
  }

  flow.heading('Safety: read before drilling and fitting');
  for (const caution of input.cautions) flow.paragraph(`• ${caution.text}`, 3.3);
  flow.paragraph(CAUTION_DEFERRAL, 3.3);

  findingsSection(flow, findings);

  flow.heading('Panels');
  const tally = (panel: string) => SEVERITIES.map((s) => count(findings.filter((f) => f.panel === panel), s)).join('/');
  flow.table(
    [
      { title: 'Carcass', width: 30 },
      { title: 'Panel', width: 26 },
      { title: 'Name', width: 40 },
      { title: 'Role', width: 16 },
      { title: 'x × y × z mm', width: 30 },
      { title: 'Status', width: 14 },
      { title: 'Bores', width: 11 },
      { title: 'E/W/N', width: flow.measure - 167 },
    ],
    input.panels.map(({ panel, bores }) => [
      carcassName(ctx, panel),
      panel.id,
      panel.name,
      panel.role,
      [panel.width, panel.height, panel.thickness].map(lengthText).join(' × '),
      panel.status,
      String(bores),
      tally(panel.id),
    ]),
  );

  flow.heading('Hardware list');
  const { hardware } = input;
  if (hardware.lines.length === 0) flow.paragraph('No fittings are placed in this job.', 3.2);
  else {
    const columns: Column[] = [{ title: 'Fitting', width: 64 }, { title: 'Purpose', width: 30 }, { title: 'Total', width: 14 }, { title: 'Per carcass', width: flow.measure - 108 }];
    flow.table(
      columns,
      hardware.lines.map((l) => [
        l.name,
        l.purpose === undefined ? 'not in the catalog' : PURPOSE_STYLES[l.purpose].label,
        String(l.total),
        l.perCarcass.flatMap((n, i) => (n > 0 ? [`${hardware.carcasses[i]}: ${n}`] : [])).join(', '),
      ]),
    );
  }
  return flow.finish(`${job.name}: cover sheet`, `${job.name}, bench pack of ${dateText(ctx.date)}`);
}
