import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { toCsv } from '../export/csv';
import { DEFAULT_MATERIALS } from '../model/default-materials';
import { cutListPanels } from './cut-list-panels';
import { CUT_LIST_MAX_PANELS, CUT_LIST_MAX_ROWS, roleFromName } from './cut-list-rules';
import { isImportable, parseCutList } from './parse-cut-list';

const HEADER = ['panel name', 'width', 'height', 'thickness', 'material', 'quantity'];

/** A cut list as a spreadsheet would save it, quoted by papaparse (RFC 4180), not by hand. */
function csv(rows: (string | number)[][], options: { header?: string[]; delimiter?: string } = {}): string {
  return Papa.unparse({ fields: options.header ?? HEADER, data: rows }, { delimiter: options.delimiter ?? ',', newline: '\r\n' });
}

const parse = (text: string) => parseCutList(text, DEFAULT_MATERIALS);
const errorsOf = (text: string) => parse(text).rows.map((r) => r.errors);

describe('reading a cut list', () => {
  it('reads each row into its values, with the role its name says and a panel count', () => {
    const list = parse(
      csv([
        ['Left side', 560, 720, 19, 'mdf-19', 1],
        ['Shelf', 540, 562, 18, 'particleboard-18', 3],
        ['Filler', 50, 720, 18, 'plywood-18', 2],
      ]),
    );
    expect(list.problems).toEqual([]);
    expect(list.rows.map(({ row, name, width, height, thickness, material, quantity, role, errors }) => ({ row, name, width, height, thickness, material, quantity, role, errors }))).toEqual([
      { row: 2, name: 'Left side', width: 560, height: 720, thickness: 19, material: 'mdf-19', quantity: 1, role: 'side', errors: [] },
      { row: 3, name: 'Shelf', width: 540, height: 562, thickness: 18, material: 'particleboard-18', quantity: 3, role: 'shelf', errors: [] },
      { row: 4, name: 'Filler', width: 50, height: 720, thickness: 18, material: 'plywood-18', quantity: 2, role: 'loose', errors: [] },
    ]);
    expect(list.panelCount).toBe(6);
    expect(isImportable(list)).toBe(true);
  });

  it('takes the header in any case and order, with common aliases and units, a BOM, and a material by its name', () => {
    const text = '\uFEFF' + csv([[2, 'MDF 19', 'Door', 400, 715, '19']], { header: ['QTY', ' Board ', 'Part', 'Width (mm)', 'LENGTH', 'thk'] });
    const [row] = parse(text).rows;
    expect(row).toMatchObject({ name: 'Door', width: 400, height: 715, thickness: 19, material: 'mdf-19', quantity: 2, role: 'door', errors: [] });
  });

  it('reads a semicolon-separated file with decimal commas, as spreadsheets in many countries save CSV', () => {
    const text = 'Panel name;Width;Height;Thickness;Material;Quantity\r\nBack;564,5;716;18;plywood-18;1\r\nShelf;"540,25";300;18;plywood-18;1\r\n';
    const list = parse(text);
    expect(list.problems).toEqual([]);
    expect(list.rows.map((r) => [r.width, r.errors])).toEqual([
      [564.5, []],
      [540.25, []],
    ]);
  });

  it('refuses a decimal comma in a comma-separated file, where it cannot be told from a separator', () => {
    expect(errorsOf(csv([['Shelf', '540,5', 300, 18, 'plywood-18', 1]]))).toEqual([
      ['width: "540,5" has a decimal comma; in a comma-separated file write a decimal point (540.5)'],
    ]);
  });

  it('skips blank lines and numbers rows as a spreadsheet does, the header being row 1', () => {
    const text = `${HEADER.join(',')}\n\nShelf,540,300,18,plywood-18,1\n,,,,,\nDoor,400,700,19,mdf-19,x\n`;
    const list = parse(text);
    expect(list.rows.map((r) => [r.row, r.errors])).toEqual([
      [3, []],
      [5, ['quantity: "x" is not a number']],
    ]);
  });
});

describe('a cut list with bad rows', () => {
  it('lists every problem of a row, each led by its column', () => {
    const list = parse(
      csv([
        ['Good', 540, 300, 18, 'plywood-18', 1],
        ['', 'wide', -5, 0, 'mdf-19', 0],
        ['Gable', 600, 3200, 19, 'mdf-19', 2.5],
        ['Shelf', 540, 300, 16, 'mdf-19', 101],
        ['Worktop', 600, 900, 38, 'oak-38', 1],
      ]),
    );
    expect(list.rows.map((r) => r.errors)).toEqual([
      [],
      [
        'panel name: must not be empty',
        'width: "wide" is not a number',
        'height: must be greater than 0 mm (it is -5)',
        'thickness: must be greater than 0 mm (it is 0)',
        'quantity: must be a whole number from 1 to 100 (it is 0)',
      ],
      // 3200 mm is longer than either common sheet (2800 × 2070, 3050 × 1250; common practice).
      ['width × height: 600 × 3200 mm is larger than the largest sheet (2800 × 2070 or 3050 × 1250 mm)', 'quantity: must be a whole number from 1 to 100 (it is 2.5)'],
      ['thickness: MDF 19 comes in 19 mm only, not 16 mm', 'quantity: must be a whole number from 1 to 100 (it is 101)'],
      [
        'material: this job has no material "oak-38"; its materials are mdf-19 (MDF 19, 19 mm), particleboard-18 (Particleboard 18, 18 mm), plywood-18 (Softwood plywood 18, 18 mm), lightweight-18 (Lightweight core board 18, 18 mm)',
      ],
    ]);
    // Only the good row counts, and one bad row makes the whole file not importable.
    expect(list.panelCount).toBe(1);
    expect(isImportable(list)).toBe(false);
    expect(() => cutListPanels(list.rows)).toThrow('Row 3 has errors');
  });

  it('fits a panel on a sheet turned either way', () => {
    // 3000 × 1200 fits the 3050 × 1250 sheet lengthwise (common practice); 1200 × 3000 is the same board turned.
    expect(errorsOf(csv([['Long', 1200, 3000, 18, 'plywood-18', 1], ['Wide', 2100, 2100, 18, 'plywood-18', 1]]))).toEqual([
      [],
      ['width × height: 2100 × 2100 mm is larger than the largest sheet (2800 × 2070 or 3050 × 1250 mm)'],
    ]);
  });

  it('says when a row has more or fewer cells than the header', () => {
    const text = `${HEADER.join(',')}\r\nShelf,540,300,18,plywood-18\r\nDoor,400,700,19,mdf-19,1,extra\r\n`;
    const [short, long] = parse(text).rows;
    expect(short.errors).toEqual(['has 5 cells where the header has 6 (is a comma missing or extra?)', 'quantity: is empty']);
    expect(long.errors).toEqual(['has 7 cells where the header has 6 (is a comma missing or extra?)']);
  });

  it('names a missing, unknown or doubled column in the header, with the names it accepts', () => {
    const { problems } = parse(csv([['Shelf', 540, 300, 18, 'grain', 'mdf-19', 1]], { header: ['name', 'width', 'w', 'thickness', 'grain', 'material', 'qty'] }));
    expect(problems.slice(0, 3)).toEqual([
      'The header names a column "grain" that a cut list does not have.',
      'The header names the "width" column 2 times (columns 2, 3).',
      'The header has no "height" column.',
    ]);
    expect(problems[3]).toMatch(/^A cut list's header names these columns, in any order, in upper or lower case: panel name \(or name, panel, part/);
  });

  it('refuses an empty file, a header alone, too many rows and too many panels', () => {
    expect(parse('').problems).toEqual(['The file is empty: a cut list starts with a header row.']);
    expect(parse(`${HEADER.join(',')}\r\n`).problems).toEqual(['The file has a header but no rows.']);
    const many = parse(csv(Array.from({ length: CUT_LIST_MAX_ROWS + 1 }, (_, i) => [`Part ${i}`, 100, 100, 18, 'plywood-18', 1])));
    expect(many).toEqual({ rows: [], problems: [`The file has ${CUT_LIST_MAX_ROWS + 1} rows; a cut list may have at most ${CUT_LIST_MAX_ROWS}. Split it into several files.`], panelCount: 0 });
    const heavy = parse(csv(Array.from({ length: 21 }, (_, i) => [`Part ${i}`, 100, 100, 18, 'plywood-18', 100])));
    expect(heavy.problems).toEqual([`The rows ask for 2100 panels; one import may create at most ${CUT_LIST_MAX_PANELS}.`]);
    expect(isImportable(heavy)).toBe(false);
  });

  it('says where a quoted cell is never closed', () => {
    const [row] = parse(`${HEADER.join(',')}\r\n"Shelf,540,300,18,plywood-18,1\r\n`).rows;
    expect(row.errors[0]).toMatch(/^cannot be read: /);
  });
});

describe('a formula in a cell', () => {
  const formula = '=HYPERLINK("http://x","y")';

  it('stays the literal text of the name and is written back defused', () => {
    const list = parse(csv([[formula, 300, 300, 18, 'plywood-18', 1]]));
    expect(list.rows[0]).toMatchObject({ name: formula, cells: { name: formula }, errors: [] });
    const [panel] = cutListPanels(list.rows);
    expect(panel.name).toBe(formula);
    // Written back through the app's one CSV writer and read by papaparse: a leading quote keeps it text
    // (OWASP's CSV injection advice; papaparse's escapeFormulae).
    const [, [cell]] = Papa.parse<string[]>(toCsv(['panel name'], [[panel.name]]), { skipEmptyLines: true }).data;
    expect(cell).toBe(`'${formula}`);
  });
});

describe('panels from a cut list', () => {
  it('numbers the copies of a row and keeps a single panel its own name', () => {
    const { rows } = parse(csv([['Shelf', 540, 300, 18, 'plywood-18', 3], ['Back', 564, 716, 18, 'plywood-18', 1]]));
    expect(cutListPanels(rows).map((p) => [p.name, p.role])).toEqual([
      ['Shelf 1', 'shelf'],
      ['Shelf 2', 'shelf'],
      ['Shelf 3', 'shelf'],
      ['Back', 'back'],
    ]);
  });

  it('takes the role from a word of the name, else loose', () => {
    expect(['Drawer front 2', 'Left SIDE', 'Shelves', 'Plinth', 'Top rail', 'Backsplash', 'Filler'].map(roleFromName)).toEqual([
      'drawer-front',
      'side',
      'shelf',
      'kickboard',
      'top',
      'loose',
      'loose',
    ]);
  });
});
