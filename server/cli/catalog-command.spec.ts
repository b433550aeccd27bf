import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { parseFittingFile } from '../../shared/catalog/parse-catalog';
import { runCli, tempFiles } from './spawn-cli';

describe('borewright catalog', () => {
  it('lists every built-in fitting by id, purpose and name', () => {
    const { code, stdout } = runCli('catalog');
    expect(code).toBe(0);
    expect(stdout).toContain(`${builtinCatalog().size} fittings`);
    expect(stdout).toMatch(/plate-2\s+mounting-plate\s+Mounting plate, 2 mm \(2 bores, on a system row\)/);
  });

  it('prints a valid catalog file with --json, shop fittings included', () => {
    const own = { id: 'shop-pin', name: 'Our pin', purpose: 'shelf-pin', onSystemRow: true, bores: [{ id: 'p', kind: 'face', x: 0, y: 0, diameter: 5, depth: 'system', source: 'our drawing' }] };
    const { 'shop.json': shop } = tempFiles({ 'shop.json': JSON.stringify({ fittings: [own] }) });
    const { code, stdout } = runCli('catalog', '--json', '--catalog', shop);
    expect(code).toBe(0);
    const parsed = parseFittingFile(JSON.parse(stdout));
    expect(parsed.ok && parsed.value.map((f) => f.id)).toEqual([...builtinCatalog().keys(), 'shop-pin']);
  });

  it('reports a broken shop file line by line, led by the path', () => {
    const { 'bad.json': bad } = tempFiles({ 'bad.json': JSON.stringify({ fittings: [{ id: 'x', name: 'X', purpose: 'runner', onSystemRow: true, bores: [] }] }) });
    const { code, stderr } = runCli('catalog', '--catalog', bad);
    expect(code).toBe(2);
    expect(stderr).toContain('bad.json: fittings[0].bores: a fitting needs at least one bore');
    expect(stderr).toMatch(/bad\.json: fittings\[0\]\.runner: /);
  });
});
