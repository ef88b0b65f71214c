import type { SliceSpec } from '../../src/engine/sliceSpec';
import { formatLength } from '../format/lengthUnit';
import { scaleBarLength } from './viewGeometry';

/** A round length drawn to scale in the corner of the 2D view. */
export function ScaleBar({ spec }: { spec: SliceSpec }) {
  const length = scaleBarLength(spec.width);
  return (
    <div
      className="scale-bar"
      data-testid="scale-bar"
      role="img"
      aria-label={`Scale bar: ${formatLength(length)}`}
    >
      <div className="scale-bar-line" style={{ width: `${(100 * length) / spec.width}%` }} />
      <span className="scale-bar-label">{formatLength(length)}</span>
    </div>
  );
}
