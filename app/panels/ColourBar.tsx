import { MASKED_COLOUR, scaleGradient, scaleTicks } from '../field/colourScale';
import { COLOUR_QUANTILES } from '../field/mapQuantity';
import { formatSI } from '../format/siFormat';
import { useDisplayedMap } from '../hooks/useDisplayedMap';

/** The map's colour scale with its quantity, unit and clamped ends spelled out. */
export function ColourBar() {
  const shown = useDisplayedMap();
  const quantity = shown?.quantity;
  const scale = shown?.scale ?? null;
  const unit = quantity?.unit ?? '';
  const offset = quantity?.offset ?? 0;
  const format = (value: number, digits = 2) => formatSI(value + offset, unit, digits);
  const scaleName =
    scale === null
      ? ''
      : scale.kind === 'diverging'
        ? scale.scale === 'log'
          ? `symmetric log, linear within ±${formatSI(scale.min, unit, 2)}`
          : 'linear, zero in the middle'
        : `${scale.scale} scale`;
  const low = scale === null ? 0 : scale.kind === 'diverging' ? -scale.max : scale.min;
  return (
    <figure className="colour-bar" aria-labelledby="colour-bar-title" data-testid="colour-bar">
      <figcaption id="colour-bar-title" className="colour-bar-title">
        {quantity?.label ?? '|E|'} <span className="unit">({unit || 'V/m'})</span>
        <br />
        <span className="muted">{scaleName}</span>
      </figcaption>
      {shown && scale ? (
        <>
          <div className="colour-bar-end">≥ {format(scale.max)}</div>
          <div className="colour-bar-body">
            <div
              className="colour-bar-ramp"
              style={{ background: scaleGradient(scale, 'to top') }}
              role="img"
              aria-label={`Colour ramp from ${format(low)} (bottom) to ${format(scale.max)} (top)`}
            />
            <div className="colour-bar-ticks" aria-hidden="true">
              {scaleTicks(scale).map(({ value, position }) => (
                <span
                  key={value}
                  className="colour-bar-tick"
                  style={{ bottom: `${100 * position}%` }}
                >
                  {format(value, 2)}
                </span>
              ))}
            </div>
          </div>
          <div className="colour-bar-end">≤ {format(low)}</div>
          <p className="colour-bar-note">
            {shown.display.range === 'auto'
              ? quantity?.label === 't_ret'
                ? 'Spans the slice’s whole range.'
                : `Spans the ${percent(COLOUR_QUANTILES.low)}–${percent(COLOUR_QUANTILES.high)} quantiles of the slice; values outside take the end colours.`
              : 'Range held by hand.'}
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
