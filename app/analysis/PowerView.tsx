import { useMemo, useState } from 'react';
import { lienardPowerHistory, sphereFlux } from '../../src/analysis/powerHistory';
import type { Triple } from '../../src/engine/sliceSpec';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';
import { formatSI } from '../format/siFormat';
import { useAppState } from '../hooks/useAppState';
import { useSliceGeometry } from '../hooks/useSliceSpec';
import { LineChart } from './LineChart';

const HISTORY_SAMPLES = 801;

/** Radiated power of the selected charge against source time; coherence of several charges. */
export function PowerView() {
  const charges = useAppState((s) => s.charges);
  const selected = useAppState((s) => s.selectedCharge);
  const scenario = useAppState((s) => s.scenario);
  const time = useAppState((s) => s.time);
  const geometry = useSliceGeometry();
  const charge = charges[selected];
  const history = useMemo(
    () => (charge ? lienardPowerHistory(charge, HISTORY_SAMPLES) : null),
    [charge],
  );
  const [coherence, setCoherence] = useState<{
    charges: typeof charges;
    time: number;
    radius: number;
    flux: ReturnType<typeof sphereFlux>;
  } | null>(null);
  const compareCharges = () => {
    // Far enough that only the radiation fields matter: a thousand times the view.
    const center: Triple = [...geometry.center];
    const radius = 1000 * Math.max(geometry.width, geometry.height);
    // Fine in φ: a relativistic charge sweeps its 1/γ beam across the sphere.
    const flux = sphereFlux(charges, center, radius, time + radius / SPEED_OF_LIGHT, {
      nTheta: 128,
      nPhi: 1024,
    });
    setCoherence({ charges, time, radius, flux });
  };
  const current = coherence !== null && coherence.charges === charges && coherence.time === time;
  if (charge === undefined || history === null) return <p className="muted">No scenario open.</p>;
  const label = scenario?.charges[selected]?.label ?? `charge ${selected + 1}`;
  let peak = 0;
  for (let k = 0; k < history.power.length; k++) peak = Math.max(peak, history.power[k]);

  return (
    <div className="analysis-view">
      <p className="muted sampling-note" data-testid="power-summary">
        {label}: Liénard power, per unit source time, over the sampled path; peak{' '}
        {formatSI(peak, 'W', 4)}, energy radiated over the path {formatSI(history.energy, 'J', 4)}.
      </p>
      <LineChart
        label={`Radiated power of ${label} in W against source time`}
        x={history.tSource}
        series={[{ label: 'P (Liénard)', values: history.power, colour: '#ff9de2' }]}
        xUnit="s"
        yUnit="W"
        testId="power-chart"
      />
      {charges.length > 1 && !current && (
        <button type="button" onClick={compareCharges}>
          Compare all charges together with each alone (at t = {formatSI(time, 's', 4)})
        </button>
      )}
      {coherence && current && (
        <p className="coherence" data-testid="coherence">
          All {charges.length} charges together, through a sphere of radius{' '}
          {formatSI(coherence.radius, 'm')} for the light sent near t = {formatSI(time, 's', 4)}:{' '}
          {formatSI(coherence.flux.total, 'W', 4)}, against{' '}
          {formatSI(coherence.flux.sumOfSingles, 'W', 4)} for the charges one at a time (ratio{' '}
          {coherence.flux.sumOfSingles > 0
            ? (coherence.flux.total / coherence.flux.sumOfSingles).toPrecision(3)
            : '–'}
          : above 1 is coherent gain, below 1 cancellation).
        </p>
      )}
    </div>
  );
}
