import { defaultMapSettings } from './mapSettings';
import { ScenarioError } from './scenarioError';
import { SCENARIO_FORMAT, SCENARIO_VERSION } from './scenarioSchema';

type Document = Record<string, unknown>;

/**
 * One step per old version: MIGRATIONS[v] turns a version-v document into a version v + 1
 * one. Each step only reshapes; the schema of the newest version checks the result.
 */
const MIGRATIONS: Record<number, (document: Document) => Document> = {
  // Version 2 added the probes and the map settings; a version-1 file had neither.
  1: (document) => ({ ...document, version: 2, probes: [], display: defaultMapSettings() }),
};

/** The oldest version this build can still read. */
export const OLDEST_SCENARIO_VERSION = 1;

/**
 * Checks the format tag and version and brings an older document up to SCENARIO_VERSION.
 * Refuses, naming the field, anything that is not a scenario object, a version newer than
 * this build, or one it never knew. Returns the document (migrated or as given) and the
 * version it was written in.
 */
export function migrateScenario(input: unknown): { document: Document; fromVersion: number } {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    throw new ScenarioError('scenario', 'must be a JSON object');
  }
  let document = input as Document;
  if (document.format !== SCENARIO_FORMAT) {
    throw new ScenarioError(
      'format',
      `must be "${SCENARIO_FORMAT}" (is this a Conecast scenario?)`,
    );
  }
  const version = document.version;
  const known = `this build reads versions ${OLDEST_SCENARIO_VERSION} to ${SCENARIO_VERSION}`;
  if (typeof version !== 'number' || !Number.isInteger(version)) {
    throw new ScenarioError('version', `must be a whole number; ${known}`);
  }
  if (version > SCENARIO_VERSION) {
    throw new ScenarioError(
      'version',
      `${version} was written by a newer Conecast; ${known}: update Conecast to open it`,
    );
  }
  if (version < OLDEST_SCENARIO_VERSION) {
    throw new ScenarioError('version', `${version} is not a Conecast scenario version; ${known}`);
  }
  for (let v = version; v < SCENARIO_VERSION; v++) document = MIGRATIONS[v](document);
  return { document, fromVersion: version };
}
