export const POWER_SUMMARY = 'power a charge radiates at a source time, and where it goes';

export const POWER_HEADER = 'source_time_s,power_W';
export const PATTERN_HEADER = 'angle_rad,dP_dOmega_source_W_per_sr,dP_dOmega_observer_W_per_sr';

export const POWER_HELP = `conecast power: ${POWER_SUMMARY}

Usage:
  conecast power --trajectory PATH.csv --charge Q --source-time T
                 [--pattern --plane xy|xz|yz --angles N]
  conecast power --scenario FILE.json [--which K] --source-time T [...]

Writes the Liénard power of the charge at source (emission) time T, in W, as CSV:
  ${POWER_HEADER}
With --pattern it writes instead the power per unit solid angle dP/dΩ (W/sr) in the
directions of a plane through the charge, at N angles from the plane's first axis
toward its second (xy: from +x toward +y; xz: +x toward +z; yz: +y toward +z):
  ${PATTERN_HEADER}
per unit source time (it integrates over all directions to the Liénard power) and
per unit observer time (divided by 1 − n·β: what a distant detector collects).
A first line starting with # gives the total power.

Options:
  --trajectory, --charge, --scenario, --length-unit, --time-unit
                    one charge, as for conecast fields
  --which K         with a scenario of several charges: the K-th (from 1)
  --source-time T   emission time, s
  --pattern         write the angular pattern instead of the total
  --plane NAME      xy (default), xz or yz
  --angles N        number of directions, from 4 to 100000 (default 360)
  -h, --help        show this help

Errors exit with status 2 and one line on standard error.
`;
