import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { checkJob } from '../../shared/checks/index';
import { parseJobDocument } from '../../shared/model/parse-job';
import { runCli, tempFiles } from './spawn-cli';

const EXAMPLE = fileURLToPath(new URL('../../examples/wall-carcass-plan.json', import.meta.url));
const files = tempFiles({
  'bad.json': JSON.stringify({ width: 600, height: 723, depth: 100, material: 'mdf-19', thickness: 18, back: { type: 'none' }, construction: 'dowels', fronts: { type: 'none' }, shelves: { type: 'none' }, mounting: { type: 'wall' } }),
  'garbled.json': '{ "width": ',
});

describe('borewright plan', () => {
  it('prints the job document of the example carcass, which the checks find free of errors', () => {
    const { code, stdout, stderr } = runCli('plan', EXAMPLE);
    expect(code).toBe(0);
    const parsed = parseJobDocument(JSON.parse(stdout));
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(parsed.value.panels.map((p) => p.role).sort()).toEqual(['back', 'bottom', 'flap', 'shelf', 'side', 'side', 'top']);
    expect(checkJob(parsed.value, builtinCatalog()).filter((f) => f.severity === 'error')).toEqual([]);
    expect(stderr.split('\n').filter(Boolean).every((line) => line.startsWith('note: '))).toBe(true);
  });

  it('exits 2 with one line per problem, led by its path, and prints nothing', () => {
    const bad = runCli('plan', files['bad.json']);
    expect(bad.code).toBe(2);
    expect(bad.stdout).toBe('');
    expect(bad.stderr).toContain('  thickness: MDF 19 comes in 19 mm only, not 18 mm');
    expect(runCli('plan', files['garbled.json']).stderr).toContain('is not valid JSON');
    expect(runCli('plan').code).toBe(2);
  });

  it('words its refusals in --units, keeps the job document in mm, and refuses a unit it does not know', () => {
    // 19 mm = 0.748031 in → 0.748; 18 mm = 0.708661 in → 0.709 (the international inch, 25.4 mm: NIST SP 811, published).
    const bad = runCli('plan', files['bad.json'], '--units', 'in');
    expect(bad.code).toBe(2);
    expect(bad.stderr).toContain('  thickness: MDF 19 comes in 0.748" only, not 0.709"');
    const inches = runCli('plan', EXAMPLE, '--units', 'in-64');
    expect(inches.code).toBe(0);
    expect(inches.stdout).toBe(runCli('plan', EXAMPLE).stdout);
    const unknown = runCli('plan', EXAMPLE, '--units', 'cm');
    expect(unknown.code).toBe(2);
    expect(unknown.stdout).toBe('');
    expect(unknown.stderr).toContain('borewright plan: --units must be one of mm, in, in-32, in-64, not "cm".');
    expect(runCli('plan', '--help').stdout).toContain('--units mm|in|in-32|in-64');
  });
});
