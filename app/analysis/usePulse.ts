import { useDeferredValue, useMemo } from 'react';
import {
  chooseSampling,
  type ProbeSeries,
  probeSeries,
  type SeriesSampling,
} from '../../src/analysis/probeSeries';
import { useAppState } from '../hooks/useAppState';
import { useSliceGeometry } from '../hooks/useSliceSpec';
import { observationSpan } from '../scenario/timeSpan';
import type { Probe } from '../store/probesSlice';

/** Most samples the app takes for one pulse: enough for detail, quick enough to redo on a drag. */
export const APP_MAX_PULSE_SAMPLES = 2 ** 16;

export interface Pulse {
  probe: Probe;
  sampling: SeriesSampling;
  series: ProbeSeries;
}

/** The selected probe, or null. */
export function useSelectedProbe(): Probe | null {
  const probes = useAppState((s) => s.probes);
  const selected = useAppState((s) => s.selectedProbe);
  return probes.find((probe) => probe.id === selected) ?? null;
}

/** The observer-time window of the pulse: the one set, or the span the time slider offers. */
export function usePulseWindow(): { from: number; to: number } | null {
  const charges = useAppState((s) => s.charges);
  const window = useAppState((s) => s.pulseWindow);
  const geometry = useSliceGeometry();
  return useMemo(() => {
    if (window !== null) return window;
    const span = observationSpan(charges, geometry);
    return span === null ? null : { from: span.start, to: span.end };
  }, [window, charges, geometry]);
}

/** E, B and S at the selected probe over the window, sampled finely enough for its pulse. */
export function usePulse(): Pulse | null {
  const probe = useDeferredValue(useSelectedProbe());
  const charges = useDeferredValue(useAppState((s) => s.charges));
  const window = usePulseWindow();
  return useMemo(() => {
    if (probe === null || window === null || charges.length === 0) return null;
    const sampling = chooseSampling(charges, probe.position, window.from, window.to, {
      maxSamples: APP_MAX_PULSE_SAMPLES,
    });
    return { probe, sampling, series: probeSeries(charges, probe.position, sampling) };
  }, [probe, charges, window]);
}
