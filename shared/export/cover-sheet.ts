import type { Finding, Severity } from '../checks/finding';
import { handText } from '../layout/side-hand';
import { CAUTION_DEFERRAL, PROGRAM_CAUTION, type Caution } from './cautions';
import { text, type Drawing } from './drawing';
import { carcassName, dateText, exportUnit, type ExportContext } from './export-context';
import type { HardwareList } from './hardware-list';
import type { PanelDrilling } from './panel-drilling';
import { PageFlow, type Column } from './page-flow';
import { ERROR_RED, INK, MUTED, PURPOSE_STYLES } from './palette';
import { PAPER, type PaperName } from './paper';
import { drawingLength, lengthText } from './units';

export interface CoverInput {
  ctx: ExportContext;
  paper: PaperName;
  /** The job's findings from shared/checks. */
  findings: readonly Finding[];
  /** Every panel with its holes and the pages of its template file, in the document's order. */
  panels: readonly { drilling: PanelDrilling; sheets: number }[];
  hardware: HardwareList;
  cautions: readonly Caution[];
  /** The files at the top of the pack, by name, for the order of work. */
  files: { labels: string; readme: string; schedule: string; hardware: string; manifest: string };
  /** Whether the pack holds drilling programs (G-code): the order of work names them and the safety notes carry their caution. */
  programs?: boolean;
}

/** Findings listed one by one on the cover; the rest are counted. */
const LISTED_FINDINGS = 60;
const SEVERITIES: readonly Severity[] = ['error', 'warning', 'note'];

/** The panel table's columns before the findings' tally, 171 mm in all: sizes in mm, the figures bare. */
const PANEL_COLUMNS_MM: readonly Column[] = [
  { title: 'Carcass', width: 28 },
  { title: 'Panel', width: 24 },
  { title: 'Name', width: 38 },
  { title: 'Role', width: 15 },
  { title: 'x × y × z mm', width: 29 },
  { title: 'Status', width: 14 },
  { title: 'Holes', width: 11 },
  { title: 'Sheets', width: 12 },
];

/** The same for inches, whose sizes (`88 63/64" × 88 63/64" × 63/64"`) take two thirds as much room again, taken from the names. */
const PANEL_COLUMNS_INCHES: readonly Column[] = [
  { title: 'Carcass', width: 22 },
  { title: 'Panel', width: 20 },
  { title: 'Name', width: 30 },
  { title: 'Role', width: 15 },
  { title: 'x × y × z in', width: 49 },
  { title: 'Status', width: 12 },
  { title: 'Holes', width: 11 },
  { title: 'Sheets', width: 12 },
];

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

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** Holes counted by diameter, largest bit first: `Ø35: 4, Ø8: 12, Ø5: 132`. */
function holesByDiameter(panels: readonly { drilling: PanelDrilling }[]): string {
  const counts = new Map<number, number>();
  for (const { drilling } of panels) for (const hole of drilling.holes) counts.set(hole.diameter, (counts.get(hole.diameter) ?? 0) + 1);
  if (counts.size === 0) return 'none';
  return [...counts.entries()]
    .sort((a, b) => b[0] - a[0])
    .map(([d, n]) => `Ø${lengthText(d)}: ${n}`)
    .join(', ');
}

/** The bench's order of work, in the pack's own terms: what to read, print, stick, fetch and drill, in turn. */
function readMeFirst(flow: PageFlow, input: CoverInput, errors: number): void {
  const paper = PAPER[input.paper].name;
  const { files } = input;
  const steps = [
    errors > 0
      ? `Read the findings below. This pack contains errors: a panel whose files say "HAS ERRORS" in the title block is not to be drilled until the error is put right.`
      : 'Read the safety notes and the findings below.',
    `Print each panel's template file on ${paper} at actual size (100 %, no "fit to page"). Its first sheet is the panel's information (title block, bore table, legend); measure the 100 mm bars on every sheet before drilling from it.`,
    `Print "${files.labels}" and stick each label on its panel: it names the panel, the face up and, on a side, LEFT or RIGHT as seen from the front, and on a door the side it is hinged on. Never drill two sides of one hand.`,
    `Fetch the hardware below from stores, carcass by carcass: shelf pins are counted four per adjustable shelf, not one per hole.`,
    `Drill each panel face up as its label and templates say, the templates' reference edge (x = 0) on the panel's reference edge. For a machine, load the panel's DXF; its layers are named as "${files.readme}" explains.${input.programs ? ` Or run its drilling programs (G-code, a file per face and edge with holes, such as "<panel>.face-a.nc"), whose headers say how the panel lies and where the zero is; prove each new program in the air or on scrap first.` : ''}`,
    `Check every hole against "${files.schedule}" (each hole once, by its key: x from the reference edge, y from the lower edge), then mark the panel drilled on the bench page.`,
    `"${files.manifest}" lists every file with its SHA-256: a file that does not match it has been changed since the pack was made.`,
  ];
  flow.heading('Read me first: the order of work');
  steps.forEach((step, i) => flow.paragraph(`${i + 1}. ${step}`, 3.3));
}

/** Per carcass: its panels, the sheets to print, its holes by diameter and the hardware to fetch. */
function contents(flow: PageFlow, input: CoverInput): void {
  const { ctx, hardware } = input;
  flow.heading('What this pack holds');
  const groups = [...ctx.job.carcasses.map((c) => ({ id: c.id as string | undefined, name: c.name })), { id: undefined, name: 'no carcass' }];
  groups.forEach((group, i) => {
    const panels = input.panels.filter(({ drilling }) => (group.id === undefined ? !ctx.job.carcasses.some((c) => c.id === drilling.panel.carcass) : drilling.panel.carcass === group.id));
    if (panels.length === 0) return;
    // Panels in no carcass have a column of their own only when they hold fittings.
    const column = group.id === undefined ? (hardware.carcasses.length > ctx.job.carcasses.length ? hardware.carcasses.length - 1 : -1) : i;
    const sheets = panels.reduce((n, p) => n + p.sheets, 0);
    const fetch = hardware.lines.filter((l) => (l.perCarcass[column] ?? 0) > 0).map((l) => `${l.name}: ${l.perCarcass[column]}`);
    const hands = panels.flatMap(({ drilling }) => {
      const hand = handText(drilling.panel, drilling.hand);
      return hand ? [`${drilling.panel.name}: ${hand}`] : [];
    });
    flow.paragraph(group.id === undefined ? 'Panels in no carcass' : `Carcass: ${group.name}`, 4.2);
    flow.paragraph(`${plural(panels.length, 'panel')}, ${plural(sheets, 'template sheet')} to print on ${PAPER[input.paper].name}.`, 3.2, INK, 4);
    flow.paragraph(`Holes by diameter: ${holesByDiameter(panels)}.`, 3.2, INK, 4);
    flow.paragraph(`Hardware to fetch: ${fetch.length > 0 ? fetch.join('; ') : 'none'}.`, 3.2, INK, 4);
    if (hands.length > 0) flow.paragraph(`Handed panels: ${hands.join('; ')}.`, 3.2, MUTED, 4);
    flow.gap(2);
  });
  const labels = ctx.job.panels.length;
  const { files } = input;
  flow.paragraph(
    `Beside this cover sheet: "${files.labels}" (${plural(labels, 'label')}), "${files.readme}" (the pack's files and the DXF layer names), "${files.schedule}", "${files.hardware}" and "${files.manifest}"; a folder per carcass holds each panel's drilling maps (SVG), DXF${input.programs ? ', drilling programs (G-code, .nc)' : ''} and template sheets (PDF).`,
    3,
    MUTED,
  );
}

/**
 * The cover sheet of a pack, as pages of the chosen paper: the job; "contains errors" in large type when
 * the checks found errors; the order of work ("read me first"); what the pack holds, carcass by carcass
 * (panels, sheets to print, holes by diameter, hardware to fetch); the cautions that apply, deferring to
 * the maker's data, local codes and licensed professionals; the findings; the panels with their status;
 * and the hardware list with the holes drilled for each fitting shown apart.
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

  readMeFirst(flow, input, errors);
  contents(flow, input);

  flow.heading('Safety: read before drilling and fitting');
  for (const caution of input.cautions) flow.paragraph(`• ${caution.text}`, 3.3);
  if (input.programs) flow.paragraph(`• Drilling programs (G-code): ${PROGRAM_CAUTION}`, 3.3);
  flow.paragraph(CAUTION_DEFERRAL, 3.3);

  findingsSection(flow, findings);

  flow.heading('Panels');
  const tally = (panel: string) => SEVERITIES.map((s) => count(findings.filter((f) => f.panel === panel), s)).join('/');
  const unit = exportUnit(ctx);
  flow.table(
    [...(unit === 'mm' ? PANEL_COLUMNS_MM : PANEL_COLUMNS_INCHES), { title: 'E/W/N', width: flow.measure - 171 }],
    input.panels.map(({ drilling: { panel, holes }, sheets }) => [
      carcassName(ctx, panel),
      panel.id,
      panel.name,
      panel.role,
      [panel.width, panel.height, panel.thickness].map((mm) => drawingLength(mm, unit)).join(' × '),
      panel.status,
      String(holes.length),
      String(sheets),
      tally(panel.id),
    ]),
    input.panels.map(({ drilling }) => (drilling.errors > 0 ? ERROR_RED : INK)),
  );

  flow.heading('Hardware list');
  const { hardware } = input;
  if (hardware.lines.length === 0) flow.paragraph('No fittings are placed in this job.', 3.2);
  else {
    const columns: Column[] = [
      { title: 'Fitting', width: 52 },
      { title: 'Purpose', width: 26 },
      { title: 'To buy', width: 13 },
      { title: 'Counted as', width: 34 },
      { title: 'Holes', width: 12 },
      { title: 'Per carcass', width: flow.measure - 137 },
    ];
    flow.table(
      columns,
      hardware.lines.map((l) => [
        l.name,
        l.purpose === undefined ? 'not in the catalog' : PURPOSE_STYLES[l.purpose].label,
        String(l.total),
        l.countedAs,
        String(l.holes),
        l.perCarcass.flatMap((n, i) => (n > 0 ? [`${hardware.carcasses[i]}: ${n}`] : [])).join(', '),
      ]),
    );
    for (const line of hardware.lines.filter((l) => l.purpose === 'shelf-pin')) flow.paragraph(`${line.name}: ${line.note}.`, 3, MUTED);
  }
  for (const note of hardware.notes) flow.paragraph(note, 3, MUTED);
  return flow.finish(`${job.name}: cover sheet`, `${job.name}, bench pack of ${dateText(ctx.date)}`);
}
