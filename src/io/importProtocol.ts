import { transferBuffers } from '../path/pathTransfer';
import type { CsvTable } from './csvTable';
import { InputError } from './inputError';
import { type ImportedTrajectory, importFromTable, readTrajectoryTable } from './trajectoryImport';
import type { TrajectoryUnits } from './trajectoryUnits';

/** The messages between the page and its import worker, in one place. */
export const IMPORT_COMMANDS = { trajectory: 'import-trajectory', forget: 'forget-file' } as const;
export const IMPORT_REPLIES = { imported: 'imported', failed: 'import-failed' } as const;

export interface TrajectoryImportRequest {
  type: typeof IMPORT_COMMANDS.trajectory;
  id: number;
  /** Names the file across requests: the same id reuses the table read before. */
  fileId: number;
  /** The file as picked or dropped; read in the worker so a large one never blocks the page. */
  file: Blob;
  /** The file's name, for messages. */
  name: string;
  units: TrajectoryUnits;
}

export interface TrajectoryImported {
  type: typeof IMPORT_REPLIES.imported;
  id: number;
  result: ImportedTrajectory;
}

export interface TrajectoryImportFailed {
  type: typeof IMPORT_REPLIES.failed;
  id: number;
  /** One line naming file, line and column. */
  message: string;
  /** 1-based line of the problem, 0 for none. */
  line: number;
  columns: string[];
}

export type ImportReply = TrajectoryImported | TrajectoryImportFailed;

/** Lets the worker drop the table it keeps for other units (the preview has closed). */
export interface ForgetFile {
  type: typeof IMPORT_COMMANDS.forget;
}

export type ImportCommand = TrajectoryImportRequest | ForgetFile;

/** The last file read, as written, so trying other units does not read it again. */
let lastRead: { fileId: number; table: CsvTable } | null = null;

/** Drops the table kept for other units. */
export function forgetImportedFile(): void {
  lastRead = null;
}

/** The worker body, also run on the page where workers are missing. */
export async function answerImport(
  request: TrajectoryImportRequest,
): Promise<{ reply: ImportReply; transfer: ArrayBuffer[] }> {
  const { id, name } = request;
  try {
    let table = lastRead?.fileId === request.fileId ? lastRead.table : null;
    if (table === null) {
      lastRead = null;
      table = readTrajectoryTable(await request.file.text(), name);
      lastRead = { fileId: request.fileId, table };
    }
    const result = importFromTable(table, request.units);
    return {
      reply: { type: IMPORT_REPLIES.imported, id, result },
      transfer: transferBuffers(result.path),
    };
  } catch (error) {
    if (error instanceof InputError) {
      const { message, line, columns } = error;
      return {
        reply: { type: IMPORT_REPLIES.failed, id, message, line, columns: [...columns] },
        transfer: [],
      };
    }
    const reason = error instanceof Error ? error.message : String(error);
    return {
      reply: {
        type: IMPORT_REPLIES.failed,
        id,
        message: `${name}: could not be read (${reason})`,
        line: 0,
        columns: [],
      },
      transfer: [],
    };
  }
}

/**
 * The import worker's loop: answers commands one at a time, in order, and skips a request
 * that a newer one has overtaken while it waited (its page has stopped waiting for it). Run
 * together, three quick changes of units would each read the whole file.
 */
export function importServer(
  post: (reply: ImportReply, transfer: ArrayBuffer[]) => void,
): (command: ImportCommand) => void {
  let newest = 0;
  let queue: Promise<void> = Promise.resolve();
  return (command) => {
    if (command.type === IMPORT_COMMANDS.forget) {
      queue = queue.then(forgetImportedFile);
      return;
    }
    newest = Math.max(newest, command.id);
    queue = queue
      .then(async () => {
        if (command.id < newest) return;
        const { reply, transfer } = await answerImport(command);
        post(reply, transfer);
      })
      .catch((error: unknown) => {
        // A reply that could not be sent must not stop the requests after it.
        const reason = error instanceof Error ? error.message : String(error);
        post(
          {
            type: IMPORT_REPLIES.failed,
            id: command.id,
            message: `${command.name}: could not be read (${reason})`,
            line: 0,
            columns: [],
          },
          [],
        );
      });
  };
}
