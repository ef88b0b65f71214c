import type { SpectrumWindow } from '../../src/analysis/spectrum';
import type { SliceCreator } from './appState';

export type AnalysisTab = 'pulse' | 'spectrum' | 'power' | 'pattern';
export type PulseQuantity = 'E' | 'B' | 'S';

/** What the analysis views show; none of it is part of the undoable document. */
export interface AnalysisSlice {
  analysisTab: AnalysisTab | null;
  /** Observer-time window of the pulse, s; null: the whole span the time slider offers. */
  pulseWindow: { from: number; to: number } | null;
  pulseQuantity: PulseQuantity;
  spectrumWindow: SpectrumWindow;
  spectrumLog: { f: boolean; density: boolean };
  /** Source time of the angular pattern, s; null: the middle of the charge's sampled span. */
  patternSourceTime: number | null;
  patternPer: 'source' | 'observer';
  /** Shade the pattern on a sphere around the charge in the 3D view. */
  patternSphere: boolean;
  setAnalysis(change: Partial<Omit<AnalysisSlice, 'setAnalysis'>>): void;
}

export const createAnalysisSlice: SliceCreator<AnalysisSlice> = (set) => ({
  analysisTab: null,
  pulseWindow: null,
  pulseQuantity: 'E',
  spectrumWindow: 'hann',
  spectrumLog: { f: true, density: true },
  patternSourceTime: null,
  patternPer: 'source',
  patternSphere: true,
  setAnalysis: (change) => set(change),
});
