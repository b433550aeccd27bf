import JSZip from 'jszip';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { JobDetail } from '../../shared/api/contract';
import { machineSettingsAnswer } from '../../shared/api/settings-contract';
import { DEFAULT_MACHINE_SETTINGS, type MachineSettings } from '../../shared/export/machine-settings';
import { ApiClient, signedIn } from '../testing/api-client';
import { attachmentName, binaryBody } from '../testing/binary-body';
import { createTestApp, type TestApp } from '../testing/test-app';

describe("the shop's machine settings", () => {
  let t: TestApp;
  let owner: ApiClient;
  let bench: ApiClient;
  let kitchen: JobDetail;

  beforeAll(async () => {
    t = await createTestApp();
    owner = await signedIn(t.app, 'owner@greyfield.example');
    bench = await signedIn(t.app, 'bench@greyfield.example');
    const { body } = await owner.get('/api/jobs').expect(200);
    const id = body.jobs.find((j: { name: string }) => j.name === 'Larch Lane kitchen').id;
    kitchen = (await owner.get(`/api/jobs/${id}`).expect(200)).body;
  });
  afterAll(() => t.close());

  const programsOf = async (client: ApiClient, panelDbId: number) => {
    const res = await client.get(`/api/panels/${panelDbId}/drilling-programs.zip`).buffer(true).parse(binaryBody).expect(200);
    const zip = await JSZip.loadAsync(res.body);
    return { name: attachmentName(res), files: await Promise.all(Object.values(zip.files).filter((f) => !f.dir).map(async (f) => ({ name: f.name, text: await f.async('string') }))) };
  };

  it('are the defaults until an admin saves them, and then what the admin saved, for every role', async () => {
    const before = machineSettingsAnswer.parse((await bench.get('/api/settings/machine').expect(200)).body);
    expect(before).toEqual({ machine: DEFAULT_MACHINE_SETTINGS, updatedAt: null, updatedBy: null });
    const mine: MachineSettings = { ...DEFAULT_MACHINE_SETTINGS, origin: 'back-right', zZero: 'table', breakthrough: 0.5, tools: [{ diameter: 5, through: false, tool: 12, feed: 900, speed: 5000 }] };
    const saved = machineSettingsAnswer.parse((await owner.put('/api/settings/machine').send(mine).expect(200)).body);
    expect(saved.machine).toEqual(mine);
    expect(saved.updatedBy).not.toBeNull();
    expect(machineSettingsAnswer.parse((await bench.get('/api/settings/machine').expect(200)).body).machine).toEqual(mine);
  });

  it('refuses settings that break their rules, naming the field', async () => {
    const twice = { ...DEFAULT_MACHINE_SETTINGS, tools: [DEFAULT_MACHINE_SETTINGS.tools[0], { ...DEFAULT_MACHINE_SETTINGS.tools[0], tool: 9 }] };
    const res = await owner.put('/api/settings/machine').send(twice).expect(400);
    expect(JSON.stringify(res.body)).toContain('tools');
    await owner.put('/api/settings/machine').send({ ...DEFAULT_MACHINE_SETTINGS, clearance: 2, retract: 5 }).expect(400);
    await bench.put('/api/settings/machine').send(DEFAULT_MACHINE_SETTINGS).expect(403);
  });

  it("make a panel's drilling programs follow them: the tools, the zero and the holes left out", async () => {
    const side = kitchen.panels.find((p) => p.role === 'side' && p.bores.length + p.placements.length > 0)!;
    await owner.put('/api/settings/machine').send(DEFAULT_MACHINE_SETTINGS).expect(200);
    const byDefault = await programsOf(bench, side.dbId);
    expect(byDefault.name).toBe(`${side.name} drilling programs.zip`);
    expect(byDefault.files.map((f) => f.name.split('/')[1])).toContain(`${side.name}.face-a.nc`);
    expect(byDefault.files[0].text).toMatch(/^%\n\(/);
    expect(byDefault.files[0].text).toContain('G21 G90');
    expect(byDefault.files[0].text).toContain('T1 M6');
    // Only a 10 mm blind bit: the 5 mm system holes now have no tool, and the program names each instead of drilling it.
    await owner.put('/api/settings/machine').send({ ...DEFAULT_MACHINE_SETTINGS, origin: 'front-right', tools: [{ diameter: 10, through: false, tool: 3, feed: 1000, speed: 4000 }] }).expect(200);
    const faceA = (await programsOf(bench, side.dbId)).files.find((f) => f.name.endsWith('.face-a.nc'))!.text;
    expect(faceA).toContain('Zero X0 Y0: the front-right corner');
    expect(faceA).not.toMatch(/^G8[13] /m);
    expect(faceA).toMatch(/no tool for blind holes of 5 mm/);
  });

  it('has no programs for a panel without holes', async () => {
    const { body: bare } = await owner.post(`/api/jobs/${kitchen.job.id}/panels`).send({ name: 'Loose shelf', role: 'shelf', width: 540, height: 300, thickness: 19, material: 'mdf-19' }).expect(201);
    expect((await bench.get(`/api/panels/${bare.dbId}/drilling-programs.zip`).expect(404)).body.error.code).toBe('no-holes');
  });
});
