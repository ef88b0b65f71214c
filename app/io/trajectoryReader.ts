import {
  answerImport,
  forgetImportedFile,
  IMPORT_COMMANDS,
  IMPORT_REPLIES,
  type ImportReply,
} from '../../src/io/importProtocol';
import type { ImportedTrajectory } from '../../src/io/trajectoryImport';
import type { TrajectoryUnits } from '../../src/io/trajectoryUnits';

/** What reading a trajectory file came to; 'superseded' when a newer read overtook it. */
export type TrajectoryReading =
  | { kind: 'imported'; result: ImportedTrajectory }
  | { kind: 'failed'; message: string; line: number; columns: string[] }
  | { kind: 'superseded' };

let worker: Worker | null = null;
let latest = 0;
const waiting = new Map<number, (reply: ImportReply | string) => void>();

/**
 * Reads and checks a trajectory file in the import worker (on this thread where workers are
 * missing). The worker keeps the table of the last `fileId` it read, so other units for the
 * same file are tried without reading it again. Only the latest read counts: an older one
 * resolves 'superseded'. A worker that dies is dropped, its read fails with the reason, and
 * the next read starts a new one.
 */
export async function readTrajectoryFile(
  file: Blob,
  fileId: number,
  name: string,
  units: TrajectoryUnits,
): Promise<TrajectoryReading> {
  const id = ++latest;
  for (const [older, settle] of waiting) if (older < id) settle('superseded');
  const request = { type: IMPORT_COMMANDS.trajectory, id, fileId, file, name, units };
  const port = importWorker();
  let reply: ImportReply | string;
  if (port === null) {
    reply = (await answerImport(request)).reply;
  } else {
    reply = await new Promise<ImportReply | string>((resolve) => {
      waiting.set(id, (answer) => {
        waiting.delete(id);
        resolve(answer);
      });
      port.postMessage(request);
    });
  }
  if (reply === 'superseded' || id !== latest) return { kind: 'superseded' };
  if (typeof reply === 'string') return { kind: 'failed', message: reply, line: 0, columns: [] };
  if (reply.type === IMPORT_REPLIES.imported) return { kind: 'imported', result: reply.result };
  return { kind: 'failed', message: reply.message, line: reply.line, columns: reply.columns };
}

/** Lets the worker drop the table it keeps of the last file (the preview has closed). */
export function forgetTrajectoryFile(): void {
  if (worker !== null) worker.postMessage({ type: IMPORT_COMMANDS.forget });
  else forgetImportedFile();
}

function importWorker(): Worker | null {
  if (worker !== null) return worker;
  if (typeof Worker !== 'function') return null;
  try {
    worker = new Worker(new URL('./importWorker.ts', import.meta.url), { type: 'module' });
  } catch {
    return null;
  }
  const current = worker;
  current.addEventListener('message', (event: MessageEvent<ImportReply>) => {
    waiting.get(event.data.id)?.(event.data);
  });
  const fail = (reason: string) => {
    current.terminate();
    if (worker === current) worker = null;
    for (const settle of waiting.values()) {
      settle(`the file could not be read: the import worker stopped (${reason})`);
    }
  };
  current.addEventListener('error', (event) => {
    event.preventDefault();
    fail(event.message || 'worker error');
  });
  current.addEventListener('messageerror', () => fail('a message could not be read'));
  return current;
}
