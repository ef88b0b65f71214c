import { formatLength } from '../format/lengthUnit';
import { formatSI } from '../format/siFormat';
import { useDisplayedMap } from '../hooks/useDisplayedMap';
import { axisName } from '../view/sliceCoordinates';

/** The numbers behind the picture: time, slice, grid, range of the quantity shown, and cost. */
export function Readouts() {
  const shown = useDisplayedMap();
  if (shown === null) return <p className="muted">No field map yet.</p>;
  const { map, quantity } = shown;
  const { spec, stats } = map;
  const plane = `${axisName(spec.u)}${axisName(spec.v)}`;
  const range = quantity.dataRange;
  return (
    <dl className="readouts">
      <dt>Map time</dt>
      <dd>t = {formatSI(spec.time, 's', 4)}</dd>
      <dt>Slice</dt>
      <dd>
        {plane} plane, {formatLength(spec.width)} × {formatLength(spec.height)}, centred at (
        {spec.center.map((c) => formatLength(c)).join(', ')})
      </dd>
      <dt>Grid</dt>
      <dd>
        {spec.nx} × {spec.ny} points, cell {formatLength(spec.width / spec.nx)}
        {map.coarse && ' (coarse first pass)'}
      </dd>
      <dt>{quantity.label} on the slice</dt>
      <dd data-testid="field-range">
        {range
          ? `${formatSI(range.min + quantity.offset, quantity.unit)} to ${formatSI(range.max + quantity.offset, quantity.unit)}`
          : 'zero everywhere'}
      </dd>
      <dt>Masked points</dt>
      <dd>{map.masked === 0 ? 'none' : `${map.masked} (on a charge)`}</dd>
      <dt>Computed</dt>
      <dd>
        in {Math.round(map.elapsedMs)} ms on{' '}
        {map.threads > 0
          ? `${map.threads} worker thread${map.threads > 1 ? 's' : ''}`
          : 'the main thread'}
        , {(stats.iterations / Math.max(1, stats.points)).toFixed(1)} solver steps per point
      </dd>
    </dl>
  );
}
