import { FIELDS_HEADER } from '../../io/fieldsCsv';
import { UNIT_OPTIONS_HELP } from '../readCharges';

export const FIELDS_SUMMARY =
  'electric and magnetic fields of moving point charges at given points';

export const FIELDS_HELP = `conecast fields: ${FIELDS_SUMMARY}

Usage:
  conecast fields --trajectory PATH.csv --charge Q [--trajectory P2.csv --charge Q2 ...]
                  --points POINTS.csv [--time T]
  conecast fields --scenario FILE.json --points POINTS.csv [--time T]

For every point, solves for the retarded time of each charge, evaluates its
Liénard–Wiechert fields there, superposes the charges and writes one CSV row to
standard output.

Options:
  --trajectory FILE  a charge's path (trajectory CSV below); repeat for more charges
  --charge Q         charge in coulombs (C), one per --trajectory, in the same order;
                     e or -e stand for plus or minus the elementary charge
                     (1.602176634e-19 C), as in --charge -e
  --scenario FILE    take the charges and their paths from a Conecast scenario (JSON)
                     instead of --trajectory and --charge (not together with them);
                     its view is not used here, so the times still come from --time
                     or the points CSV
${UNIT_OPTIONS_HELP}
  --points FILE      observation points (points CSV below)
  --time T           observation time in seconds (s) for every point: required when
                     the points CSV has no t column, refused when it has one
  -h, --help         show this help
  Options take their value as --name VALUE or --name=VALUE.

Trajectory CSV, one row per sample, times strictly increasing (units: SI, or as
set by --length-unit L and --time-unit T):
  t          time, s (T)                      required
  x,y,z      position, m (L)                  required
  vx,vy,vz   velocity, m/s (L/T)              optional, all three or none
  bgx,bgy,bgz
             velocity as beta*gamma = gamma*v/c, optional, all three or none;
             not together with vx,vy,vz
  ax,ay,az   acceleration, m/s^2 (L/T^2)      optional, all three or none
  Missing velocities or accelerations are taken from a smooth spline through the
  samples. The charge must stay slower than light everywhere. Before the first
  sample and after the last the charge moves in a straight line at the first or last
  velocity, with zero acceleration.

Points CSV, one row per observation point:
  x,y,z      position, m                      required
  t          observation time, s              optional; else --time applies

CSV format: comma-separated decimal numbers (1.5, -2e-9). The first line that is
neither blank nor a comment is the header naming the columns, in any order, with
case-sensitive names. Lines starting with # are comments; blank lines are skipped;
CRLF line ends are accepted.

Output CSV on standard output, the header row first, then one row per point in input
order, every number at full double precision:
  ${FIELDS_HEADER}
  x,y,z            the point, m
  t                observation time, s
  t_ret            retarded time of the first charge, s
  Ex,Ey,Ez         electric field E, V/m
  Bx,By,Bz         magnetic flux density B, T
  Ex_rad,Ey_rad,Ez_rad
                   acceleration (radiation) part of E, V/m; E minus it is the
                   velocity (bound) part
  Sx,Sy,Sz         Poynting vector E x B / mu0, W/m^2
  on_charge        1 where the point lies on a charge (all its fields are then written
                   as 0), else 0

Exit status: 0 on success; 2 for a usage or input error, reported as one line on
standard error naming the file, line and column (for a scenario, the file and the
field, as in "s.json: charges[0].path.params.beta: must be below 1"); 1 for an
internal error.

Example:
  conecast fields --trajectory beam.csv --charge -e --points grid.csv --time 1e-9 \\
    > fields.csv
  conecast fields --scenario orbit.json --points grid.csv --time 1e-9 > fields.csv
`;
