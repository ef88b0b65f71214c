export const PROBE_SUMMARY = 'what a probe records over an observer-time window, or its spectrum';

import { PROBE_HEADER, SPECTRUM_HEADER } from '../../io/probeCsv';

export const PROBE_HELP = `conecast probe: ${PROBE_SUMMARY}

Usage:
  conecast probe --trajectory PATH.csv --charge Q [--trajectory P2.csv --charge Q2 ...]
                 --at X,Y,Z --from T0 --to T1 [--samples N] [--spectrum] [--window hann|none]
  conecast probe --scenario FILE.json --at X,Y,Z --from T0 --to T1 [...]

Evaluates E, B and the Poynting vector S at one point for N evenly spaced observer
times from T0 to T1 (both included) and writes CSV to standard output:
  ${PROBE_HEADER}
in s, V/m, T and W/m². With --spectrum it writes instead the one-sided energy
spectral density per unit area at the point, 2·ε0·c·|Ẽ(f)|² in J/(m²·Hz):
  ${SPECTRUM_HEADER}
for f = 0, 1/(N·Δt), … up to the Nyquist frequency, where Δt = (T1 − T0)/(N − 1).

Options:
  --trajectory, --charge, --scenario, --length-unit, --time-unit
                    the charges, as for conecast fields
  --at X,Y,Z        the probe's position in m
  --from T0         start of the observer-time window, s
  --to T1           end of the window, s (after T0)
  --samples N       number of times (at least 2; a power of two with --spectrum).
                    Without it the sampling is chosen from the paths' time scales and
                    the Doppler compression 1 − n·β seen from the probe, and the choice
                    is explained on standard error
  --spectrum        write the spectrum instead of the time series
  --window NAME     window before the transform: hann (default) or none
  -h, --help        show this help

Errors exit with status 2 and one line on standard error.

Example:
  conecast probe --scenario orbit.json --at 1,0,0 --from 3e-9 --to 4e-9 --spectrum
`;
