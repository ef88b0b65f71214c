import { QUANTITIES } from '../../io/sliceQuantities';

export const SLICE_SUMMARY =
  'fields on a rectangular grid in a plane at one time, to .npy, .csv or .json';

export const SLICE_HELP = `conecast slice: ${SLICE_SUMMARY}

Usage:
  conecast slice --trajectory PATH.csv --charge Q [--trajectory P2.csv --charge Q2 ...]
                 --time T --plane xy|xz|yz|ORIGIN;U;V --center X,Y,Z --size W,H
                 --res NX,NY --out FILE.npy|FILE.csv|FILE.json
                 [--quantity E|B|S|Erad|all] [--stats] [--threads N] [--near-radius R]
  conecast slice --scenario FILE.json --out FILE.npy|FILE.csv|FILE.json
                 [--time T] [--plane P] [--center X,Y,Z] [--size W,H] [--res NX,NY] ...

Computes the Liénard–Wiechert fields of the charges on an NX x NY grid of cell
centres covering W x H metres of a plane, at observation time T, using one worker
thread per core, and writes them to FILE (the format follows its extension).

Options:
  --trajectory, --charge, --length-unit, --time-unit
                  as for "conecast fields" (trajectory CSV, charge in C or e/-e)
  --scenario FILE the charges from a Conecast scenario (JSON) instead of --trajectory
                  and --charge (not together with them); its view gives the defaults
                  for --time, --plane, --center, --size and --res, and any of these
                  given on the command line wins (a view centre is moved onto a custom
                  --plane like --center)
  --time T        observation time, s
  --plane P       xy, xz or yz (axes u,v = x,y / x,z / y,z), or ORIGIN;U;V: the plane
                  through ORIGIN spanned by U and V (each X,Y,Z; normalised; must be
                  orthogonal), e.g. "0,0,0;1,1,0;0,0,1"; quote it in the shell
  --center X,Y,Z  centre of the slice, m (default 0,0,0, or ORIGIN for a custom plane;
                  moved onto a custom plane along its normal)
  --size W,H      extent along u and v, m
  --res NX,NY     grid points along u and v (1 to 8192 each)
  --out FILE      output file; .npy also writes FILE.npy.json beside it (see below)
  --quantity Q    what is written (default E):
${Object.entries(QUANTITIES)
  .map(([name, parts]) => `                    ${name.padEnd(5)} ${parts.join(', ')}`)
  .join('\n')}
  --stats         print one JSON line on stderr: {"points":…,"ms":…,"threads":…,"samples":…}
                  (ms is the engine's own compute time; samples counts all path samples)
  --threads N     worker threads (default: one per core; 1 computes on the main thread)
  --near-radius R points closer than R (m) to a charge are masked: fields 0, on_charge 1
                  (default a quarter of the smaller cell side); so are points so near a
                  charge that E or S would exceed what float32 holds (never Infinity)
  -h, --help      show this help

Grid: point (i, j) sits at centre + ((i+0.5)/NX - 0.5) W u + ((j+0.5)/NY - 0.5) H v.
Units: E and Erad in V/m, B in T, S in W/m^2, delay (t - t_ret of the first charge) in s.

Formats:
  .npy   NumPy's open format: little-endian float32, C order, shape NY x NX x components;
         FILE.npy.json holds spec, time, component names, units and Conecast version
  .csv   '#' lines with version, time, spec and units, then a header x,y,z,<components>
         and one row per point in order j*NX + i (positions in m)
  .json  {format, conecast, spec, time, components, units, nx, ny, data: {Ex: [...], ...}}
         with each array row-major j*NX + i
`;
