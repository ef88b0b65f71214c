import { useEffect, useState } from 'react';
import type { SlicePool } from '../../src/engine/slicePool';
import { createBrowserSlicePool } from '../engine/browserSlicePool';
import { computeFieldMap } from '../field/computeFieldMap';
import type { FieldMap } from '../field/fieldMap';
import { useAppState } from './useAppState';
import { useSliceSpec } from './useSliceSpec';

/** The latest map, whether a newer one is on its way, and why the last attempt failed. */
export interface FieldMapState {
  map: FieldMap | null;
  pending: boolean;
  error: string | null;
  /** The last worker fault, in one line, if any worker had to be replaced. */
  fault: string | null;
}

/** A slice pool that lives as long as the component (made in an effect, as StrictMode needs). */
function useSlicePool(onFault: (message: string) => void): SlicePool | null {
  const [pool, setPool] = useState<SlicePool | null>(null);
  useEffect(() => {
    const made = createBrowserSlicePool(onFault);
    setPool(made);
    return () => made.dispose();
  }, [onFault]);
  return pool;
}

/**
 * The field map of the current scenario, view and time, from the worker pool. A coarse map
 * shows first; a request that a newer one overtakes is cancelled, never finished.
 */
export function useFieldMap(): FieldMapState {
  const charges = useAppState((s) => s.charges);
  const spec = useSliceSpec();
  const [state, setState] = useState<FieldMapState>({
    map: null,
    pending: false,
    error: null,
    fault: null,
  });
  const [onFault] = useState(
    () => (message: string) => setState((s) => ({ ...s, fault: message })),
  );
  const pool = useSlicePool(onFault);

  useEffect(() => {
    if (pool !== null) pool.setScene(charges);
  }, [pool, charges]);

  useEffect(() => {
    if (pool === null || charges.length === 0) return;
    let current = true;
    setState((previous) => ({ ...previous, pending: true }));
    computeFieldMap(pool, spec, charges, (coarse) => {
      if (current)
        setState((previous) => ({
          ...previous,
          map: previous.map?.coarse === false ? previous.map : coarse,
        }));
    })
      .then((map) => {
        if (current && map !== null)
          setState((previous) => ({ ...previous, map, pending: false, error: null }));
      })
      .catch((error: unknown) => {
        const message = error instanceof Error ? error.message : String(error);
        if (current) setState((previous) => ({ ...previous, pending: false, error: message }));
      });
    return () => {
      current = false;
    };
  }, [pool, spec, charges]);

  return state;
}
