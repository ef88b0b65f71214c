import { createStore, delMany, getMany, keys, setMany, type UseStore } from 'idb-keyval';

/** What the list of autosaved work shows of one piece of work. */
export interface WorkRecord {
  id: string;
  /** When it was last saved, ms since 1970 (Date.now()). */
  savedAt: number;
  title: string;
}

const META = 'meta:';
const DOCUMENT = 'document:';

/**
 * Work in progress kept in the browser's IndexedDB through idb-keyval: per piece of work a
 * small record for listing and the document itself, always written together in one
 * transaction, so a crash mid-save leaves the previous save whole.
 */
export class WorkStore {
  private readonly store: UseStore;

  constructor(databaseName = 'conecast-work') {
    this.store = createStore(databaseName, 'work');
  }

  /** Every saved piece of work, newest first. */
  async list(): Promise<WorkRecord[]> {
    const metaKeys = (await keys<string>(this.store)).filter((key) => key.startsWith(META));
    const records = await getMany<WorkRecord>(metaKeys, this.store);
    return records
      .filter((record): record is WorkRecord => record !== undefined)
      .sort((a, b) => b.savedAt - a.savedAt);
  }

  /** The document saved for `id`, as stored (check it before use), or undefined. */
  async load(id: string): Promise<unknown> {
    const [document] = await getMany([DOCUMENT + id], this.store);
    return document;
  }

  /** Saves the record and its document together, or neither (one transaction). */
  async save(record: WorkRecord, document: unknown): Promise<void> {
    await setMany(
      [
        [DOCUMENT + record.id, document],
        [META + record.id, record],
      ],
      this.store,
    );
  }

  async remove(id: string): Promise<void> {
    await delMany([META + id, DOCUMENT + id], this.store);
  }
}
