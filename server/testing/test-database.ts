import { readFileSync } from 'node:fs';
import { inject } from 'vitest';
import { openDatabase, type DatabaseHandle } from '../db/client';

/** An in-memory database from the run's template: migrated and empty, or holding the demo shop. */
export function openTestDatabase(template: 'empty' | 'demo'): Promise<DatabaseHandle> {
  return openDatabase({ engine: 'pglite', template: readFileSync(inject('dbTemplates')[template]) });
}
