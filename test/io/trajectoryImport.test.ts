import { describe, expect, it, vi } from 'vitest';
import {
  answerImport,
  forgetImportedFile,
  IMPORT_COMMANDS,
  type ImportReply,
  importServer,
} from '../../src/io/importProtocol';
import { InputError } from '../../src/io/inputError';
import { importTrajectory } from '../../src/io/trajectoryImport';
import { SI_UNITS, type TrajectoryUnits } from '../../src/io/trajectoryUnits';
import { SPEED_OF_LIGHT as c } from '../../src/physics/constants';

/** Invented: uniform motion at 0.6 c along x, written in mm and ns with velocities in mm/ns. */
function uniformText(rows: number): string {
  const v = 0.6 * c * 1e-6; // mm/ns
  const lines = ['# invented: 0.6 c along x', 't,x,y,z,vx,vy,vz'];
  for (let i = 0; i < rows; i++) lines.push(`${i * 0.01},${v * i * 0.01},1,0,${v},0,0`);
  return `${lines.join('\n')}\n`;
}

describe('importTrajectory', () => {
  it('sums up the samples, span, extent and speed in SI', () => {
    const { summary, path } = importTrajectory(uniformText(101), 'u.csv', {
      length: 'mm',
      time: 'ns',
    });
    expect(summary.rows).toBe(101);
    expect(summary.names).toEqual(['t', 'x', 'y', 'z', 'vx', 'vy', 'vz']);
    expect(summary.firstRows[1][0]).toBe(0.01);
    expect(summary.velocity).toBe('velocity');
    expect(summary.timeSpan[0]).toBe(0);
    // 1 ns = 1e-9 s; the product 100·1e-9 rounds within a few ulps.
    expect(summary.timeSpan[1]).toBeCloseTo(1e-9, 20);
    expect(summary.min[1]).toBeCloseTo(1e-3, 15);
    expect(summary.max[0]).toBeCloseTo(0.6 * c * 1e-9, 12);
    // γ = 1/√(1 − 0.36) = 1.25 exactly (Jackson 3rd ed. §11.3).
    expect(summary.maxBeta).toBeCloseTo(0.6, 12);
    expect(summary.maxGamma).toBeCloseTo(1.25, 11);
    expect(summary.positionsPerVelocity).toBeCloseTo(1, 9);
    expect(path.vx[0]).toBeCloseTo(0.6 * c, 3);
  });

  it('notices velocities whose units disagree with the positions', () => {
    // Invented: 1e5 m/s along x, positions in mm but velocities left in m/s. Read with
    // lengths in mm the velocities become 100 m/s while the positions move at 1e5 m/s.
    const text = 't,x,y,z,vx,vy,vz\n0,0,0,0,1e5,0,0\n1e-6,100,0,0,1e5,0,0\n2e-6,200,0,0,1e5,0,0\n';
    const { summary } = importTrajectory(text, 'mixed.csv', { length: 'mm', time: 's' });
    expect(summary.positionsPerVelocity).toBeCloseTo(1000, 6);
    const positionsOnly = importTrajectory('t,x,y,z\n0,0,0,0\n1,1,0,0\n', 'p.csv', {
      length: 'm',
      time: 's',
    });
    expect(positionsOnly.summary.positionsPerVelocity).toBeNull();
  });

  it('refuses more than a million rows at the first row too many', () => {
    const lines = ['t,x,y,z'];
    for (let i = 0; i <= 1_000_000; i++) lines.push(`${i},0,0,0`);
    let error: unknown;
    try {
      importTrajectory(lines.join('\n'), 'long.csv', { length: 'm', time: 's' });
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).line).toBe(1_000_002);
    expect((error as InputError).message).toBe(
      'long.csv line 1000002: more than 1000000 samples, the most a path may hold; thin the file out',
    );
  });
});

describe('answerImport, the import worker body', () => {
  let files = 0;
  const request = (text: string, fileId = ++files, units: TrajectoryUnits = SI_UNITS) => ({
    type: IMPORT_COMMANDS.trajectory,
    id: 7,
    fileId,
    file: new Blob([text]),
    name: 'beam.csv',
    units,
  });

  it('answers a good file with the path, its columns handed over as transferables', async () => {
    const { reply, transfer } = await answerImport(request(uniformText(5)));
    expect(reply.type).toBe('imported');
    expect(reply.id).toBe(7);
    expect(transfer).toHaveLength(10);
    expect(transfer.every((buffer) => buffer instanceof ArrayBuffer)).toBe(true);
  });

  it('tries other units on the table it read, without reading the file again', async () => {
    const fileId = ++files;
    const first = request(uniformText(11), fileId, { length: 'mm', time: 'ns' });
    const inMmNs = await answerImport(first);
    // The same file named by its id: its Blob is not read again (this one is empty).
    const again = { ...request('', fileId, { length: 'm', time: 's' }) };
    const text = vi.spyOn(again.file, 'text');
    const inSi = await answerImport(again);
    expect(text).not.toHaveBeenCalled();
    // The rows came from the table kept: 0 to 0.1 ns read in ns, 0 to 0.1 s read in s.
    const span = (answer: typeof inSi) =>
      answer.reply.type === 'imported' ? answer.reply.result.summary.timeSpan[1] : Number.NaN;
    expect(span(inMmNs)).toBeCloseTo(1e-10, 22);
    expect(span(inSi)).toBeCloseTo(0.1, 12);
    forgetImportedFile();
    const afterForget = await answerImport({ ...request('', fileId, SI_UNITS) });
    expect(afterForget.reply.type === 'import-failed' && afterForget.reply.message).toContain(
      'empty file',
    );
  });

  it('answers a broken file with its line and column', async () => {
    const { reply } = await answerImport(request('t,x,y,z\n0,0,0,0\n1,0,abc,0\n'));
    expect(reply).toEqual({
      type: 'import-failed',
      id: 7,
      message: 'beam.csv line 3, column "y": not a number: "abc"',
      line: 3,
      columns: ['y'],
    });
  });
});

describe('the import worker loop', () => {
  it('reads a file once for quick changes of units and answers only the newest request', async () => {
    const replies: ImportReply[] = [];
    const serve = importServer((reply) => replies.push(reply));
    const file = new Blob([uniformText(21)]);
    const text = vi.spyOn(file, 'text');
    const ask = (id: number, units: TrajectoryUnits) =>
      serve({ type: IMPORT_COMMANDS.trajectory, id, fileId: 900, file, name: 'u.csv', units });
    ask(1, SI_UNITS);
    ask(2, { length: 'mm', time: 's' });
    ask(3, { length: 'mm', time: 'ns' });
    serve({ type: IMPORT_COMMANDS.forget });
    await vi.waitFor(() => expect(replies.map((reply) => reply.id)).toContain(3));
    // Asked before any had started: the two overtaken ones were skipped while they waited.
    expect(replies.map((reply) => reply.id)).toEqual([3]);
    expect(text).toHaveBeenCalledTimes(1);
  });
});
