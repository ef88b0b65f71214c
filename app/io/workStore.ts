import { createStore, getMany, keys, promisifyRequest, type UseStore } from 'idb-keyval';

/** What the list of autosaved work shows of one piece of work. */
export interface WorkRecord {
  id: string;
  /** When it was last saved, ms since 1970 (Date.now()). */
  savedAt: number;
  title: string;
}

const META = 'meta:';
const DOCUMENT = 'document:';
const COLUMN = 'column:';
/** Sample columns at least this long are kept under keys of their own, written once. */
const SEPARATE_COLUMN = 4096;

/** Where a document's large sample column is kept, in place of the column. */
interface ColumnReference {
  storedColumn: string;
}

function isReference(value: unknown): value is ColumnReference {
  return typeof value === 'object' && value !== null && 'storedColumn' in value;
}

/**
 * Work in progress kept in the browser's IndexedDB through idb-keyval: per piece of work a
 * small record for listing and the document itself, always written together in one
 * transaction, so a crash mid-save leaves the previous save whole. Long sample columns (an
 * imported path) are kept under keys of their own and written only the first time: later
 * saves of the same work, after a probe moved say, write only the small document.
 */
export class WorkStore {
  private readonly store: UseStore;
  /** For the work last saved or read, the columns already kept and their keys. */
  private readonly kept = new Map<string, Map<Float64Array, string>>();
  private nextColumn = 0;

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
    // Document and columns in one transaction, so no save can come between them.
    const found = await this.store('readonly', async (objects) => {
      const document: unknown = await promisifyRequest(objects.get(DOCUMENT + id));
      const references: ColumnReference[] = [];
      visitColumns(document, (value) => {
        if (isReference(value)) references.push(value);
        return value;
      });
      const columns = await Promise.all(
        references.map(
          (reference) => promisifyRequest(objects.get(reference.storedColumn)) as Promise<unknown>,
        ),
      );
      return {
        document,
        columns: new Map(references.map((reference, k) => [reference, columns[k]])),
      };
    });
    if (found.document === undefined) return undefined;
    const kept = new Map<Float64Array, string>();
    const restored = visitColumns(found.document, (value) => {
      if (!isReference(value)) return value;
      const column = found.columns.get(value);
      if (column instanceof Float64Array) kept.set(column, value.storedColumn);
      return column;
    });
    this.keep(id, kept);
    return restored;
  }

  /** Remembers the columns kept for the open work only: others' would pin their memory. */
  private keep(id: string, columns: Map<Float64Array, string>): void {
    this.kept.clear();
    this.kept.set(id, columns);
  }

  /**
   * Saves the record and its document together, or nothing (one transaction): long columns
   * not yet kept for this work are written, those it no longer uses deleted.
   */
  async save(record: WorkRecord, document: unknown): Promise<void> {
    const before = this.kept.get(record.id) ?? new Map<Float64Array, string>();
    const after = new Map<Float64Array, string>();
    const writes: [string, unknown][] = [];
    const stored = visitColumns(document, (value) => {
      if (!(value instanceof Float64Array) || value.length < SEPARATE_COLUMN) return value;
      let key = before.get(value) ?? after.get(value);
      if (key === undefined) {
        key = `${COLUMN}${record.id}:${Date.now().toString(36)}-${this.nextColumn++}`;
        writes.push([key, value]);
      }
      after.set(value, key);
      return { storedColumn: key } satisfies ColumnReference;
    });
    const unused = [...before.values()].filter((key) => ![...after.values()].includes(key));
    await this.store('readwrite', (objects) => {
      try {
        for (const [key, value] of writes) objects.put(value, key);
        objects.put(stored, DOCUMENT + record.id);
        objects.put(record, META + record.id);
        for (const key of unused) objects.delete(key);
      } catch (error) {
        // A value that cannot be stored: undo the puts already made, so nothing lands.
        objects.transaction.abort();
        throw error;
      }
      return promisifyRequest(objects.transaction);
    });
    this.keep(record.id, after);
  }

  /** The keys of the long columns kept for a piece of work. */
  async columnKeys(id: string): Promise<string[]> {
    return (await keys<string>(this.store)).filter((key) => key.startsWith(`${COLUMN}${id}:`));
  }

  /** Forgets a piece of work: its record, its document and its columns. */
  async remove(id: string): Promise<void> {
    const columns = await this.columnKeys(id);
    await this.store('readwrite', (objects) => {
      for (const key of [META + id, DOCUMENT + id, ...columns]) objects.delete(key);
      return promisifyRequest(objects.transaction);
    });
    this.kept.delete(id);
  }
}

/** A copy of a scenario document with each samples path's columns passed through `change`. */
function visitColumns(document: unknown, change: (value: unknown) => unknown): unknown {
  if (typeof document !== 'object' || document === null) return document;
  const charges = (document as { charges?: unknown }).charges;
  if (!Array.isArray(charges)) return document;
  return {
    ...document,
    charges: charges.map((charge) => {
      const path = (charge as { path?: unknown } | null)?.path as
        | Record<string, unknown>
        | undefined;
      if (typeof path !== 'object' || path === null || path.kind !== 'samples') return charge;
      const changed = Object.fromEntries(
        Object.entries(path).map(([name, value]) => [
          name,
          name === 'kind' ? value : change(value),
        ]),
      );
      return { ...charge, path: changed };
    }),
  };
}
