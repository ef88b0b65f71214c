import type { SliceSpec } from '../../src/engine/sliceSpec';
import { linearTicks } from '../format/axisTicks';
import { lengthUnitFor } from '../format/lengthUnit';
import { axisCoordinate, axisName } from './sliceCoordinates';

/** Tick labels in world coordinates along the slice's two edges, drawn in HTML around the canvas. */
export function SliceAxes({ spec }: { spec: SliceSpec }) {
  const unit = lengthUnitFor(Math.max(spec.width, spec.height));
  const axes = [
    { key: 'u', axis: spec.u, extent: spec.width },
    { key: 'v', axis: spec.v, extent: spec.height },
  ] as const;
  return axes.map(({ key, axis, extent }) => {
    const lo = axisCoordinate(spec, axis, -extent / 2);
    const hi = axisCoordinate(spec, axis, extent / 2);
    const ticks = linearTicks(lo / unit.metres, hi / unit.metres, 4);
    return (
      <div key={key} className={`slice-axis slice-axis-${key}`} aria-hidden="true">
        {ticks.map((tick) => {
          const share = (100 * (tick * unit.metres - lo)) / (hi - lo);
          const style = key === 'u' ? { left: `${share}%` } : { bottom: `${share}%` };
          return (
            <span key={tick} className="slice-tick" style={style}>
              {formatTick(tick)}
            </span>
          );
        })}
        <span className="slice-axis-title">
          {axisName(axis)} ({unit.symbol})
        </span>
      </div>
    );
  });
}

/** Tick values with a true minus sign and no floating-point tails. */
function formatTick(value: number): string {
  const text = String(Number(value.toPrecision(6)));
  return text.startsWith('-') ? `\u2212${text.slice(1)}` : text;
}
