import {
  buildCharges,
  parseScenarioText,
  type Scenario,
  ScenarioError,
} from '../../src/io/scenario';
import type { Charge } from '../../src/physics/charge';
import type { SliceCreator } from './appState';

export type ScenarioStatus = 'empty' | 'loading' | 'ready' | 'failed';

export interface ScenarioSlice {
  scenario: Scenario | null;
  /** The scenario's charges with their sampled paths, in document order. */
  charges: readonly Charge[];
  /** Where the scenario came from (a URL or file name). */
  scenarioSource: string | null;
  scenarioStatus: ScenarioStatus;
  /** One line naming what is wrong, when the status is 'failed'. */
  scenarioError: string | null;
  beginScenarioLoad(source: string): void;
  /** Parses and builds a scenario document; on success also shows its view and time. */
  applyScenarioText(text: string, source: string): void;
  failScenarioLoad(source: string, message: string): void;
}

export const createScenarioSlice: SliceCreator<ScenarioSlice> = (set, get) => ({
  scenario: null,
  charges: [],
  scenarioSource: null,
  scenarioStatus: 'empty',
  scenarioError: null,
  beginScenarioLoad: (source) =>
    set({ scenarioSource: source, scenarioStatus: 'loading', scenarioError: null }),
  applyScenarioText: (text, source) => {
    let scenario: Scenario;
    let charges: Charge[];
    try {
      scenario = parseScenarioText(text);
      charges = buildCharges(scenario);
    } catch (error) {
      if (!(error instanceof ScenarioError)) throw error;
      get().failScenarioLoad(source, error.message);
      return;
    }
    set({
      scenario,
      charges,
      scenarioSource: source,
      scenarioStatus: 'ready',
      scenarioError: null,
    });
    get().showView(scenario.view);
    get().setTime(scenario.view.time);
  },
  failScenarioLoad: (source, message) =>
    set({ scenarioSource: source, scenarioStatus: 'failed', scenarioError: message }),
});
