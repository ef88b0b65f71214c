import { NEGATIVE_COLOUR, POSITIVE_COLOUR } from '../view/ChargeMarkers';
import { PATH_COLOUR } from '../view/ChargePaths';
import { PROBE_COLOUR, RETARDED_COLOUR } from '../view/ProbeMarkers';
import { SHELL_COLOUR } from '../view/ShellLines';

/** What the marks over the map stand for. */
export function MapLegend() {
  return (
    <ul className="map-legend" aria-label="Key to the marks on the map">
      <li>
        <span className="legend-line" style={{ background: PATH_COLOUR }} /> charge path over its
        sampled span (straight on either side of it)
      </li>
      <li>
        <span className="legend-dot" style={{ background: NEGATIVE_COLOUR }} />
        <span className="legend-dot" style={{ background: POSITIVE_COLOUR }} /> present position of
        a negative / positive charge
      </li>
      <li>
        <span className="legend-line" style={{ background: SHELL_COLOUR }} /> light-cone shell: how
        far the light sent from the dot at its centre has got by now
      </li>
      <li>
        <span className="legend-dot" style={{ background: PROBE_COLOUR }} /> probe;{' '}
        <span className="legend-dot" style={{ background: RETARDED_COLOUR }} /> the retarded
        position it sees now, joined by the line of sight
      </li>
    </ul>
  );
}
