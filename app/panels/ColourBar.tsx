import type { ValueRange } from '../field/fieldMap';
import { COLOUR_QUANTILES } from '../field/fieldMap';
import { colourGradient, logPosition, MASKED_COLOUR } from '../field/logColourScale';
import { logTicks } from '../format/axisTicks';
import { formatSI } from '../format/siFormat';

/** The log colour scale of |E| in V/m, with its clamped ends spelled out. */
export function ColourBar({ range }: { range: ValueRange | null }) {
  return (
    <figure className="colour-bar" aria-labelledby="colour-bar-title">
      <figcaption id="colour-bar-title" className="colour-bar-title">
        |E| <span className="unit">(V/m)</span>
        <br />
        <span className="muted">log scale</span>
      </figcaption>
      {range ? (
        <>
          <div className="colour-bar-end">≥ {formatSI(range.max, 'V/m', 2)}</div>
          <div className="colour-bar-body">
            <div
              className="colour-bar-ramp"
              style={{ background: colourGradient('to top') }}
              role="img"
              aria-label={`Colour ramp from ${formatSI(range.min, 'V/m', 2)} (dark) to ${formatSI(range.max, 'V/m', 2)} (light)`}
            />
            <div className="colour-bar-ticks" aria-hidden="true">
              {logTicks(range.min, range.max).map((value) => (
                <span
                  key={value}
                  className="colour-bar-tick"
                  style={{ bottom: `${100 * logPosition(range, value)}%` }}
                >
                  {formatSI(value, 'V/m', 1)}
                </span>
              ))}
            </div>
          </div>
          <div className="colour-bar-end">≤ {formatSI(range.min, 'V/m', 2)}</div>
          <p className="colour-bar-note">
            Spans the {percent(COLOUR_QUANTILES.low)}–{percent(COLOUR_QUANTILES.high)} quantiles of
            the slice; values outside take the end colours.
          </p>
          <p className="colour-bar-note">
            <span className="swatch" style={{ background: MASKED_COLOUR }} /> on a charge, not
            evaluated
          </p>
        </>
      ) : (
        <div className="colour-bar-empty">no field yet</div>
      )}
    </figure>
  );
}

function percent(share: number): string {
  return `${Number((100 * share).toPrecision(3))} %`;
}
