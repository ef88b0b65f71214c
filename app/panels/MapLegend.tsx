import { MARKER_COLOUR } from '../view/ChargeMarkers';
import { PATH_COLOUR } from '../view/ChargePaths';

/** What the line and the dot over the map stand for. */
export function MapLegend() {
  return (
    <ul className="map-legend">
      <li>
        <span className="legend-line" style={{ background: PATH_COLOUR }} /> charge path over its
        sampled span, projected on the slice
      </li>
      <li>
        <span className="legend-dot" style={{ background: MARKER_COLOUR }} /> present position at
        the observation time (the fields come from earlier, retarded positions)
      </li>
    </ul>
  );
}
