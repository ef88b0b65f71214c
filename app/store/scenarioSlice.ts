import {
  buildCharges,
  parseScenario,
  parseScenarioText,
  type Scenario,
  type ScenarioCharge,
  ScenarioError,
} from '../../src/io/scenario';
import type { Charge } from '../../src/physics/charge';
import { observationSpan, suggestedRate } from '../scenario/timeSpan';
import type { SliceCreator } from './appState';
import { displayStateOf } from './displaySlice';
import { selectSliceSpec } from './sliceSpecOf';

export type ScenarioStatus = 'empty' | 'loading' | 'ready' | 'failed';

export interface ScenarioSlice {
  /**
   * The open document. Its view, probes and display are as opened: the live ones are in the
   * view, time, probes and display slices, and scenarioDocument() puts them together.
   */
  scenario: Scenario | null;
  /** The scenario as it was opened, so the summary can say when it has been edited. */
  openedScenario: Scenario | null;
  /** The scenario's charges with their sampled paths, in document order. */
  charges: readonly Charge[];
  /** Index of the charge the path editors work on. */
  selectedCharge: number;
  /** Where the scenario came from (a URL or file name). */
  scenarioSource: string | null;
  scenarioStatus: ScenarioStatus;
  /** One line naming what is wrong, when the status is 'failed'. */
  scenarioError: string | null;
  beginScenarioLoad(source: string): void;
  /** Parses and builds a scenario document; on success opens it (see openScenarioDocument). */
  applyScenarioText(text: string, source: string): void;
  /**
   * Opens a checked document: its charges (built here unless given), probes, map settings,
   * view and time replace what is open, and undo starts afresh.
   */
  openScenarioDocument(scenario: Scenario, source: string, charges?: Charge[]): void;
  failScenarioLoad(source: string, message: string): void;
  /**
   * Replaces the charges after checking them as a whole scenario. Returns null when applied,
   * else the one-line reason (naming the field) and leaves everything as it was.
   * `record` false applies without an undo step (a drag records once, at its start).
   */
  editCharges(next: readonly ScenarioCharge[], label: string, record?: boolean): string | null;
  selectCharge(index: number): void;
  /** Changes the title, note or invented flag as one undoable edit; returns the reason it could not. */
  editScenarioInfo(change: Partial<Pick<Scenario, 'title' | 'note' | 'invented'>>): string | null;
}

export const createScenarioSlice: SliceCreator<ScenarioSlice> = (set, get) => ({
  scenario: null,
  openedScenario: null,
  charges: [],
  selectedCharge: 0,
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
    get().openScenarioDocument(scenario, source, charges);
  },
  openScenarioDocument: (scenario, source, charges = buildCharges(scenario)) => {
    set({
      scenario,
      openedScenario: scenario,
      charges,
      selectedCharge: 0,
      scenarioSource: source,
      scenarioStatus: 'ready',
      scenarioError: null,
      // Another document is other work: its changes are autosaved under a record of their own.
      workId: null,
      autosavedAt: null,
      unkeptWork: false,
    });
    get().clearHistory();
    get().replaceProbes(scenario.probes);
    set(displayStateOf(scenario.display));
    get().showView(scenario.view);
    get().setTime(scenario.view.time);
    const span = observationSpan(charges, selectSliceSpec(get()));
    if (span !== null) get().setRate(suggestedRate(span));
  },
  failScenarioLoad: (source, message) =>
    set({ scenarioSource: source, scenarioStatus: 'failed', scenarioError: message }),
  editCharges: (next, label, record = true) => {
    const current = get().scenario;
    if (current === null) return 'no scenario is open';
    let scenario: Scenario;
    let charges: Charge[];
    try {
      scenario = parseScenario({ ...current, charges: next });
      charges = buildCharges(scenario);
    } catch (error) {
      if (error instanceof ScenarioError) return error.message;
      throw error;
    }
    if (record) get().record(label);
    set((state) => ({
      scenario,
      charges,
      selectedCharge: Math.min(state.selectedCharge, charges.length - 1),
    }));
    return null;
  },
  editScenarioInfo: (change) => {
    const current = get().scenario;
    if (current === null) return 'no scenario is open';
    let scenario: Scenario;
    try {
      scenario = parseScenario({ ...current, ...change });
    } catch (error) {
      if (error instanceof ScenarioError) return error.message;
      throw error;
    }
    get().record('describe the scenario');
    // The paths are the same, so the built charges stay as they are.
    set({ scenario });
    return null;
  },
  selectCharge: (index) => {
    if (index >= 0 && index < get().charges.length) set({ selectedCharge: index });
  },
});
