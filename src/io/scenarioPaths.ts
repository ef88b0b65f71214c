import type { z } from 'zod';
import { type AnalyticMotion, sampleMotion } from '../path/analyticMotion';
import { ExpressionError, expressionColumns } from '../path/expressionPath';
import {
  brakingToRest,
  circularOrbit,
  constantProperAcceleration,
  lineOscillation,
  transverseKick,
  undulatorWiggle,
  uniformMotion,
} from '../path/presets';
import { PATH_COLUMNS, PathError, SampledPath } from '../path/sampledPath';
import { SketchError, sketchColumns } from '../path/sketchPath';
import type { ScenarioPath } from './scenario';
import { fieldPath, ScenarioError } from './scenarioError';
import { type presetPathSchema, type SampleColumn, sketchIssuePath } from './scenarioSchema';

/**
 * Paths already built. Parsing a document makes new objects, so paths are found by content:
 * a samples path by its column arrays (the schema passes them through untouched), any other
 * by its JSON text, which is short. An edit that leaves a path alone (a probe moved, another
 * charge changed, undo) then reuses its samples instead of sampling a formula or solving a
 * million-point spline again, and undo history shares them instead of holding copies.
 */
const bySamples = new WeakMap<SampleColumn, { columns: unknown[]; sampled: SampledPath }>();
const byText = new Map<string, SampledPath>();
/** Samples the paths remembered by text may hold in all (80 bytes each); the least recently used go first. */
const TEXT_CACHE_SAMPLES = 2_000_000;
let textCacheSamples = 0;

/** The sampled path of one scenario path; `where` names it in errors (`charges[0].path`). */
export function buildPath(path: ScenarioPath, where: string): SampledPath {
  const known = findBuilt(path);
  if (known !== undefined) return known;
  const result = samplePath(path, where);
  rememberBuiltPath(path, result);
  return result;
}

/** Lets a path built elsewhere (an import worker) stand for its document content. */
export function rememberBuiltPath(path: ScenarioPath, sampled: SampledPath): void {
  if (path.kind === 'samples') {
    bySamples.set(path.t, { columns: PATH_COLUMNS.map((name) => path[name]), sampled });
    return;
  }
  const key = JSON.stringify(path);
  forgetText(key);
  byText.set(key, sampled);
  textCacheSamples += sampled.count;
  // Keep at least the newest path, however long.
  while (textCacheSamples > TEXT_CACHE_SAMPLES && byText.size > 1) {
    forgetText(byText.keys().next().value as string);
  }
}

function forgetText(key: string): void {
  const known = byText.get(key);
  if (known === undefined) return;
  textCacheSamples -= known.count;
  byText.delete(key);
}

function findBuilt(path: ScenarioPath): SampledPath | undefined {
  if (path.kind === 'samples') {
    const entry = bySamples.get(path.t);
    const same = entry?.columns.every((column, k) => column === path[PATH_COLUMNS[k]]);
    return same ? entry?.sampled : undefined;
  }
  const key = JSON.stringify(path);
  const sampled = byText.get(key);
  if (sampled !== undefined) {
    byText.delete(key);
    byText.set(key, sampled);
  }
  return sampled;
}

function samplePath(path: ScenarioPath, where: string): SampledPath {
  try {
    switch (path.kind) {
      case 'samples':
        return new SampledPath(path);
      case 'preset':
        return new SampledPath(sampleMotion(presetMotion(path), path.from, path.to, path.samples));
      case 'sketch':
        return new SampledPath(
          sketchColumns(path.controls, path.speed, path.startTime, path.samples),
        );
      case 'expression':
        return new SampledPath(expressionColumns(path, path.from, path.to, path.samples));
    }
  } catch (error) {
    if (error instanceof PathError) {
      // Speed errors concern the whole path ('v'); the others name a real column.
      const column = path.kind === 'samples' && error.column !== 'v' ? `.${error.column}` : '';
      throw new ScenarioError(where + column, error.message);
    }
    if (error instanceof SketchError) {
      throw new ScenarioError(`${where}.${fieldPath(sketchIssuePath(error))}`, error.message);
    }
    if (error instanceof ExpressionError) {
      throw new ScenarioError(`${where}.${error.field}`, error.detail);
    }
    throw error;
  }
}

function presetMotion(path: z.infer<typeof presetPathSchema>): AnalyticMotion {
  switch (path.preset) {
    case 'circularOrbit':
      return circularOrbit(path.params.radius, path.params.beta);
    case 'uniformMotion':
      return uniformMotion(path.params.beta);
    case 'lineOscillation':
      return lineOscillation(path.params.amplitude, path.params.frequency);
    case 'constantProperAcceleration':
      return constantProperAcceleration(path.params.alpha);
    case 'brakingToRest':
      return brakingToRest(path.params.beta0, path.params.stopTime);
    case 'undulatorWiggle':
      return undulatorWiggle(path.params.gamma, path.params.strength, path.params.period);
    case 'transverseKick':
      return transverseKick(path.params.beta, path.params.angle, path.params.duration);
  }
}
