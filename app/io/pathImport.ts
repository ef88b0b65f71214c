import {
  rememberBuiltPath,
  type ScenarioCharge,
  type ScenarioSamplesPath,
} from '../../src/io/scenario';
import type { TrajectoryUnits } from '../../src/io/trajectoryUnits';
import { SampledPath } from '../../src/path/sampledPath';
import { withPath } from '../scenario/chargeEdits';
import { sceneForPath } from '../scenario/pathScene';
import { observationSpan, suggestedRate } from '../scenario/timeSpan';
import { appStore } from '../store/appStore';
import { selectSliceSpec } from '../store/sliceSpecOf';
import { forgetTrajectoryFile, readTrajectoryFile } from './trajectoryReader';

/**
 * Largest trajectory file read, bytes: room for a million rows of ten columns at full
 * precision, and below the longest string a browser makes (2²⁹ characters).
 */
const MAX_TRAJECTORY_BYTES = 500 * 2 ** 20;

let files = 0;

/** Opens the import preview for a picked or dropped trajectory file and starts reading it. */
export function startPathImport(file: File): void {
  const previous = appStore.getState().pathImport;
  const units = previous?.units ?? { length: 'm', time: 's' };
  appStore.getState().setPathImport({
    file,
    fileId: ++files,
    name: file.name,
    units,
    status: 'reading',
    result: null,
    error: null,
    fitView: previous?.fitView ?? true,
  });
  if (file.size > MAX_TRAJECTORY_BYTES) {
    appStore.getState().updatePathImport({
      status: 'failed',
      error: `${file.name} is ${Math.round(file.size / 2 ** 20)} MB, more than the 500 MB this page reads`,
    });
    return;
  }
  void read(units);
}

/** Reads the file again in other units (the preview shows the result). */
export function changeImportUnits(units: TrajectoryUnits): void {
  if (appStore.getState().pathImport === null) return;
  appStore.getState().updatePathImport({ units, status: 'reading', result: null, error: null });
  void read(units);
}

async function read(units: TrajectoryUnits): Promise<void> {
  const current = appStore.getState().pathImport;
  if (current === null) return;
  const reading = await readTrajectoryFile(current.file, current.fileId, current.name, units);
  const now = appStore.getState().pathImport;
  if (reading.kind === 'superseded' || now === null || now.file !== current.file) return;
  if (reading.kind === 'failed') {
    appStore.getState().updatePathImport({ status: 'failed', error: reading.message });
  } else {
    appStore.getState().updatePathImport({ status: 'ready', result: reading.result, error: null });
  }
}

/**
 * Makes the previewed path the selected charge's ('replace') or a new charge's ('add'), as
 * one undoable edit; fits the view to it when asked. Returns the one-line reason it could not.
 */
export function takeImportedPath(mode: 'replace' | 'add'): string | null {
  const state = appStore.getState();
  const pending = state.pathImport;
  if (pending?.result == null || state.scenario === null) return 'nothing to import';
  const { summary, path: built } = pending.result;
  // The worker's columns go into the document as they are: no million-element copies.
  const path: ScenarioSamplesPath = {
    kind: 'samples',
    t: built.t,
    x: built.x,
    y: built.y,
    z: built.z,
  };
  if (summary.velocity !== 'none')
    Object.assign(path, { vx: built.vx, vy: built.vy, vz: built.vz });
  if (summary.accelerations) Object.assign(path, { ax: built.ax, ay: built.ay, az: built.az });
  // The worker built the path already: the store takes it as it is instead of again.
  rememberBuiltPath(path, SampledPath.restore(built));
  const charges = state.scenario.charges;
  const index = mode === 'replace' ? state.selectedCharge : charges.length;
  const label = pending.name.replace(/\.[^.]*$/, '').slice(0, 100) || 'imported';
  const next: ScenarioCharge[] =
    mode === 'replace'
      ? withPath(charges, index, path)
      : [...charges, { label, charge: charges[state.selectedCharge].charge, path }];
  const problem = state.editCharges(next, `import a path from ${pending.name}`);
  if (problem !== null) return problem;
  state.selectCharge(index);
  if (pending.fitView) {
    const scene = sceneForPath(summary);
    const side = Math.max(...state.resolution);
    state.showView({ ...scene, resolution: [side, side] });
    state.setTime(scene.time);
    const span = observationSpan(appStore.getState().charges, selectSliceSpec(appStore.getState()));
    if (span !== null) state.setRate(suggestedRate(span));
  }
  closePathImport();
  return null;
}

/** Closes the preview; the worker lets go of the file it kept for other units. */
export function closePathImport(): void {
  appStore.getState().setPathImport(null);
  forgetTrajectoryFile();
}
