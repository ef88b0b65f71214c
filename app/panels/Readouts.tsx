import type { FieldMap } from '../field/fieldMap';
import { formatLength } from '../format/lengthUnit';
import { formatSI } from '../format/siFormat';
import { axisName } from '../view/sliceCoordinates';

/** The numbers behind the picture: time, slice, grid, field range and cost. */
export function Readouts({ map }: { map: FieldMap | null }) {
  if (map === null) return <p className="muted">No field map yet.</p>;
  const { spec, range, stats } = map;
  const plane = `${axisName(spec.u)}${axisName(spec.v)}`;
  return (
    <dl className="readouts">
      <dt>Map time</dt>
      <dd>t = {formatSI(spec.time, 's', 4)}</dd>
      <dt>Slice</dt>
      <dd>
        {plane} plane, {formatLength(spec.width)} × {formatLength(spec.height)}, centred{' '}
        {spec.center.every((c) => c === 0)
          ? 'on the origin'
          : `at (${spec.center.map(formatLength).join(', ')})`}
      </dd>
      <dt>Grid</dt>
      <dd>
        {spec.nx} × {spec.ny} points, cell {formatLength(spec.width / spec.nx)}
        {map.coarse && ' (coarse first pass)'}
      </dd>
      <dt>|E| on the slice</dt>
      <dd data-testid="field-range">
        {range
          ? `${formatSI(range.min, 'V/m')} to ${formatSI(range.max, 'V/m')}`
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
