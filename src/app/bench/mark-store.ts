import { InjectionToken } from '@angular/core';
import { openDB, type DBSchema } from 'idb';
import { PanelStatus } from '../../../shared/model/job-document';

/** A mark made at the bench, kept on this device until the server has it. */
export interface QueuedMark {
  /** Order of making; the marks are sent in this order. */
  seq: number;
  /** The member who made it: only they see it and only their session sends it. */
  userId: number;
  jobId: number;
  panelDbId: number;
  /** The panel's name when marked, for the messages. */
  name: string;
  from: PanelStatus;
  to: PanelStatus;
  /** The panel's version the mark was made on; the server refuses it if the panel changed since. */
  version: number;
  madeAt: string;
  /** Why the server refused it: kept and shown until the member has read it. */
  refused?: { code: string; reason: string };
}

export type NewMark = Omit<QueuedMark, 'seq'>;

/** Where marks wait. In the browser IndexedDB, which outlives a reload and a closed tab. */
export interface MarkStore {
  /** Keeps a new mark; resolves with its `seq`. */
  add(mark: NewMark): Promise<number>;
  /** The member's marks, in the order they were made. */
  list(userId: number): Promise<QueuedMark[]>;
  put(mark: QueuedMark): Promise<void>;
  remove(seq: number): Promise<void>;
}

interface BenchDb extends DBSchema {
  marks: { key: number; value: QueuedMark; indexes: { 'by-user': number } };
}

function indexedDbMarkStore(): MarkStore {
  const db = openDB<BenchDb>('borewright-bench', 1, {
    upgrade(db) {
      db.createObjectStore('marks', { keyPath: 'seq', autoIncrement: true }).createIndex('by-user', 'userId');
    },
  });
  return {
    // The key is given by the store (autoIncrement), so the new mark goes in without one.
    add: async (mark) => (await db).add('marks', mark as QueuedMark),
    // One user's marks come from the index in key order, which is the order of making.
    list: async (userId) => (await db).getAllFromIndex('marks', 'by-user', userId),
    put: async (mark) => void (await (await db).put('marks', mark)),
    remove: async (seq) => (await db).delete('marks', seq),
  };
}

export const MARK_STORE = new InjectionToken<MarkStore>('bench marks waiting to send', { providedIn: 'root', factory: indexedDbMarkStore });
