import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { openDatabase } from '../db/client';
import { seedDemoShop } from '../demo/seed-demo';

declare module 'vitest' {
  export interface ProvidedContext {
    /** Data folder tarballs to start in-memory databases from: migrated and empty, and with the demo shop. */
    dbTemplates: { empty: string; demo: string };
  }
}

/**
 * A new PGlite database costs seconds (initdb); loading a dumped one well under one. So the run
 * migrates one database once, dumps it empty and again with the demo shop, and every test file
 * starts from a dump (test-database.ts).
 */
export default async function setup(project: TestProject): Promise<() => void> {
  const dir = mkdtempSync(path.join(tmpdir(), 'borewright-templates-'));
  const handle = await openDatabase({ engine: 'pglite' });
  await handle.migrate();
  const empty = path.join(dir, 'empty.tar');
  writeFileSync(empty, await handle.dumpDataDir!());
  await seedDemoShop(handle.db);
  const demo = path.join(dir, 'demo.tar');
  writeFileSync(demo, await handle.dumpDataDir!());
  await handle.close();
  project.provide('dbTemplates', { empty, demo });
  // The command line's specs spawn bin/borewright.mjs in parallel: its bundle is built once, here, before them.
  const { freshBundle } = await import('../../scripts/server-bundle.mjs');
  await freshBundle('cli');
  return () => rmSync(dir, { recursive: true, force: true });
}
