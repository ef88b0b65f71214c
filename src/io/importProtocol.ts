import { transferBuffers } from '../path/pathTransfer';
import { InputError } from './inputError';
import { type ImportedTrajectory, importTrajectory } from './trajectoryImport';
import type { TrajectoryUnits } from './trajectoryUnits';

/** The messages between the page and its import worker, in one place. */
export const IMPORT_COMMANDS = { trajectory: 'import-trajectory' } as const;
export const IMPORT_REPLIES = { imported: 'imported', failed: 'import-failed' } as const;

export interface TrajectoryImportRequest {
  type: typeof IMPORT_COMMANDS.trajectory;
  id: number;
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

/** The worker body, also run on the page where workers are missing. */
export async function answerImport(
  request: TrajectoryImportRequest,
): Promise<{ reply: ImportReply; transfer: ArrayBuffer[] }> {
  const { id, name } = request;
  try {
    const text = await request.file.text();
    const result = importTrajectory(text, name, request.units);
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
