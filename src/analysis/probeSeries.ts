import type { Triple } from '../engine/sliceSpec';
import { pathState } from '../path/pathState';
import type { SampledPath } from '../path/sampledPath';
import type { Charge } from '../physics/charge';
import { SPEED_OF_LIGHT } from '../physics/constants';
import { fieldSample } from '../physics/fieldSample';
import { evaluateFields, poyntingVector } from '../physics/fields';
import { retardedSolution, solveRetardedTime } from '../physics/retardedTime';
import { vec3 } from '../physics/vec3';

const c = SPEED_OF_LIGHT;

/** How the observer-time window [from, to] is sampled: t_k = from + k·step, k < samples. */
export interface SeriesSampling {
  from: number;
  to: number;
  /** A power of two, so the series can go straight into an FFT. */
  samples: number;
  /** (to − from)/(samples − 1), s: both ends of the window are sampled. */
  step: number;
  /** One sentence, SI units with prefixes, saying why this step was chosen. */
  reason: string;
}

export interface SamplingOptions {
  /** Samples per Doppler-compressed feature; 16 unless given. */
  pointsPerFeature?: number;
  /** Fewest samples, a power of two; 256 unless given. */
  minSamples?: number;
  /** Most samples, a power of two; 2^18 unless given. */
  maxSamples?: number;
}

const DEFAULT_POINTS_PER_FEATURE = 16;
const DEFAULT_MIN_SAMPLES = 256;
const DEFAULT_MAX_SAMPLES = 2 ** 18;
/** Evenly spaced source times looked at before the scan knows the motion's time scale. */
const COARSE_POINTS = 257;
/** Scan points per shortest time scale of the motion: enough to catch each κ minimum. */
const SCAN_PER_SCALE = 4;
const MIN_SCAN_POINTS = 1025;
const MAX_SCAN_POINTS = 2 ** 16 + 1;
/** Golden-section steps refining the smallest κ: shrinks its bracket by 0.618^60 ≈ 3e-13. */
const REFINE_STEPS = 60;

type ScaleKind = 'knots' | 'acceleration' | 'turn' | 'speed' | 'distance';

const SCALE_TEXT: Record<ScaleKind, string> = {
  knots: "spacing of the path's samples",
  acceleration: 'time in which the acceleration changes, max|a|/max|da/dt|',
  turn: 'time in which the velocity turns through the beaming angle 1/γ, v²/(γ|v × a|)',
  speed: 'time in which 1 − β changes by itself, (1 − β)c/|a∥|',
  distance: 'time the charge takes to cross its distance R from the point, R/v',
};

/** What limits one charge's sampling: its shortest source-time scale and smallest κ. */
interface ChargeScale {
  /** Shortest time scale of the motion over the retarded window, s (∞ for none). */
  scale: number;
  kind: ScaleKind;
  /** Smallest Doppler factor 1 − n·β seen from the point over the window. */
  kappa: number;
}

const state = pathState();
const solution = retardedSolution();

/**
 * Chooses the sampling of the observer-time window [from, to] at `point` fine enough to
 * resolve the pulse. Each charge's own time scales over the source times that reach the point
 * in the window (t_r from the retarded solutions at `from` and `to`) are the shortest of: the
 * spacing of its path samples, max|a|/max|da/dt|, the time v²/(γ|v × a|) its velocity needs
 * to turn through the beaming angle 1/γ, the time (1 − β)c/|a∥| in which 1 − β changes by
 * itself, and R/v, the time to cross its distance from the point. An observer sees that scale
 * shortened by the Doppler compression κ = 1 − n·β (dt = κ dt_r; Jackson, Classical
 * Electrodynamics 3rd ed., §14.3), taken at its smallest value over the window, found by
 * scanning the source times evenly and refining the smallest by golden-section search. The
 * step puts at least `pointsPerFeature` (16) samples on the shortest compressed feature over
 * the charges; the count is rounded up to a power of two for the FFT and kept between
 * `minSamples` (256) and `maxSamples` (2^18), which `reason` then says.
 */
export function chooseSampling(
  charges: readonly Charge[],
  point: Triple,
  from: number,
  to: number,
  options: SamplingOptions = {},
): SeriesSampling {
  const pointsPerFeature = options.pointsPerFeature ?? DEFAULT_POINTS_PER_FEATURE;
  const minSamples = options.minSamples ?? DEFAULT_MIN_SAMPLES;
  const maxSamples = options.maxSamples ?? DEFAULT_MAX_SAMPLES;
  if (!(Number.isFinite(from) && Number.isFinite(to) && to > from)) {
    throw new RangeError(`chooseSampling: need finite from < to, got [${from}, ${to}] s`);
  }
  if (!point.every(Number.isFinite)) {
    throw new RangeError(`chooseSampling: the point must be finite, got ${point.join(', ')}`);
  }
  if (!(pointsPerFeature > 0 && Number.isFinite(pointsPerFeature))) {
    throw new RangeError(
      `chooseSampling: pointsPerFeature must be positive, not ${pointsPerFeature}`,
    );
  }
  if (!isPowerOfTwo(minSamples) || !isPowerOfTwo(maxSamples) || minSamples < 2) {
    throw new RangeError(
      `chooseSampling: minSamples and maxSamples must be powers of two from 2 up, not ${minSamples} and ${maxSamples}`,
    );
  }
  if (maxSamples < minSamples) {
    throw new RangeError(
      `chooseSampling: maxSamples ${maxSamples} is below minSamples ${minSamples}`,
    );
  }

  let feature = Number.POSITIVE_INFINITY;
  let limit: ChargeScale | null = null;
  for (const { path } of charges) {
    const scale = chargeScale(path, point, from, to);
    const compressed = scale.scale * scale.kappa;
    if (compressed < feature) {
      feature = compressed;
      limit = scale;
    }
  }

  const span = to - from;
  const pts = `${formatCount(pointsPerFeature)} points`;
  if (limit === null || !(feature > 0) || !Number.isFinite(feature)) {
    const step = span / (minSamples - 1);
    const why =
      charges.length === 0
        ? 'there are no charges'
        : 'no charge accelerates or moves relative to the point, so the fields there do not change';
    return {
      from,
      to,
      samples: minSamples,
      step,
      reason: `step ${si(step, 's')}: ${why}, so the fewest samples (${minSamples}) span the window`,
    };
  }

  const wanted = feature / pointsPerFeature;
  const needed = Math.ceil(span / wanted) + 1;
  let samples = nextPowerOfTwo(needed);
  let bound = '';
  if (samples > maxSamples) {
    samples = maxSamples;
    bound = `; capped at ${maxSamples} samples, so the step is coarser than the ${si(wanted, 's')} wanted and the pulse is under-resolved`;
  } else if (samples < minSamples) {
    samples = minSamples;
    bound = `; raised to the fewest samples (${minSamples})`;
  }
  const step = span / (samples - 1);
  const reason =
    `step ${si(step, 's')}: the shortest time scale of the motion, the ${si(limit.scale, 's')} ${SCALE_TEXT[limit.kind]}, ` +
    `shortened by the smallest Doppler factor κ = 1 − n·β = ${limit.kappa.toPrecision(3)} seen from the point ` +
    `to ${si(feature, 's')}, at ${pts} per feature${bound}`;
  return { from, to, samples, step, reason };
}

/** One charge's shortest time scale over the source times seen in [from, to], and its smallest κ. */
function chargeScale(path: SampledPath, point: Triple, from: number, to: number): ChargeScale {
  const [rx, ry, rz] = point;
  solveRetardedTime(path, rx, ry, rz, from, state, solution);
  const t0 = solution.tRet;
  solveRetardedTime(path, rx, ry, rz, to, state, solution);
  const t1 = solution.tRet;
  const scales = new MotionScales();

  // The path's own samples inside the source window.
  const first = Math.max(0, path.locate(t0) + 1);
  const last = Math.min(path.count - 1, path.locate(t1));
  for (let i = first; i <= last; i++) {
    if (i > 0) scales.offer(path.t[i] - path.t[i - 1], 'knots');
    if (i + 1 < path.count) scales.offer(path.t[i + 1] - path.t[i], 'knots');
    path.stateAt(path.t[i], state, i);
    scales.add(rx, ry, rz);
  }
  // Even coarse points: a window inside one piece still gets a look at the motion.
  for (let k = 0; k < COARSE_POINTS; k++) {
    path.stateAt(t0 + ((t1 - t0) * k) / (COARSE_POINTS - 1), state);
    scales.add(rx, ry, rz);
  }
  const own = scales.shortest();

  // Scan κ on a grid fine against the shortest scale, then refine its smallest value.
  const range = t1 - t0;
  const byScale = Number.isFinite(own.scale) ? Math.ceil((SCAN_PER_SCALE * range) / own.scale) : 0;
  const count = Math.min(MAX_SCAN_POINTS, Math.max(MIN_SCAN_POINTS, byScale + 1));
  let best = 0;
  let kappa = Number.POSITIVE_INFINITY;
  let hint = -1;
  for (let k = 0; k < count; k++) {
    const tr = t0 + (range * k) / (count - 1);
    hint = path.stateAt(tr, state, hint);
    const value = kappaAt(rx, ry, rz);
    if (value < kappa) {
      kappa = value;
      best = k;
    }
  }
  if (range > 0) kappa = refineKappa(path, rx, ry, rz, t0, range / (count - 1), best, count, kappa);
  return { scale: own.scale, kind: own.kind, kappa };
}

/** Golden-section search for the smallest κ between the scan points either side of the best. */
function refineKappa(
  path: SampledPath,
  rx: number,
  ry: number,
  rz: number,
  t0: number,
  h: number,
  best: number,
  count: number,
  kappa: number,
): number {
  const g = 0.5 * (Math.sqrt(5) - 1);
  let a = t0 + h * Math.max(0, best - 1);
  let b = t0 + h * Math.min(count - 1, best + 1);
  let x1 = b - g * (b - a);
  let x2 = a + g * (b - a);
  path.stateAt(x1, state);
  let f1 = kappaAt(rx, ry, rz);
  path.stateAt(x2, state);
  let f2 = kappaAt(rx, ry, rz);
  let smallest = Math.min(kappa, f1, f2);
  for (let k = 0; k < REFINE_STEPS; k++) {
    if (f1 < f2) {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - g * (b - a);
      path.stateAt(x1, state);
      f1 = kappaAt(rx, ry, rz);
    } else {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + g * (b - a);
      path.stateAt(x2, state);
      f2 = kappaAt(rx, ry, rz);
    }
    smallest = Math.min(smallest, f1, f2);
  }
  return smallest;
}

/** κ = 1 − n·β from the current `state` to the point; 1 on the charge itself. */
function kappaAt(rx: number, ry: number, rz: number): number {
  const dx = rx - state.px;
  const dy = ry - state.py;
  const dz = rz - state.pz;
  const distance = Math.sqrt(dx * dx + dy * dy + dz * dz);
  if (!(distance > 0)) return 1;
  return 1 - (dx * state.vx + dy * state.vy + dz * state.vz) / (distance * c);
}

/** Running shortest time scales of a motion, fed one state at a time. */
class MotionScales {
  private maxAcceleration = 0;
  private maxJerk = 0;
  private best = Number.POSITIVE_INFINITY;
  private bestKind: ScaleKind = 'knots';

  offer(scale: number, kind: ScaleKind): void {
    if (scale > 0 && scale < this.best) {
      this.best = scale;
      this.bestKind = kind;
    }
  }

  /** Takes the scales of the current `state`, seen from the point r. */
  add(rx: number, ry: number, rz: number): void {
    const { vx, vy, vz, ax, ay, az, jx, jy, jz } = state;
    const v2 = vx * vx + vy * vy + vz * vz;
    const a = Math.sqrt(ax * ax + ay * ay + az * az);
    const j = Math.sqrt(jx * jx + jy * jy + jz * jz);
    if (a > this.maxAcceleration) this.maxAcceleration = a;
    if (j > this.maxJerk) this.maxJerk = j;
    if (v2 > 0) {
      const v = Math.sqrt(v2);
      const gamma = 1 / Math.sqrt(1 - v2 / (c * c));
      const cx = vy * az - vz * ay;
      const cy = vz * ax - vx * az;
      const cz = vx * ay - vy * ax;
      const cross = Math.sqrt(cx * cx + cy * cy + cz * cz);
      this.offer(v2 / (gamma * cross), 'turn');
      const along = Math.abs(vx * ax + vy * ay + vz * az) / v;
      this.offer(((1 - v / c) * c) / along, 'speed');
      const distance = Math.hypot(rx - state.px, ry - state.py, rz - state.pz);
      this.offer(distance / v, 'distance');
    }
  }

  shortest(): { scale: number; kind: ScaleKind } {
    this.offer(this.maxAcceleration / this.maxJerk, 'acceleration');
    return { scale: this.best, kind: this.bestKind };
  }
}

/** E, B and S at the point (V/m, T, W/m²) for t_k = from + k·step, k < samples, as columns. */
export interface ProbeSeries {
  t: Float64Array;
  ex: Float64Array;
  ey: Float64Array;
  ez: Float64Array;
  bx: Float64Array;
  by: Float64Array;
  bz: Float64Array;
  sx: Float64Array;
  sy: Float64Array;
  sz: Float64Array;
}

/**
 * E, B and the Poynting vector at `point` for t_k = from + k·step, k < samples, from
 * evaluateFields and poyntingVector with no near radius, so every value equals what
 * `conecast fields` writes for the same point and time.
 */
export function probeSeries(
  charges: readonly Charge[],
  point: Triple,
  sampling: Pick<SeriesSampling, 'from' | 'step' | 'samples'>,
): ProbeSeries {
  const { from, step, samples } = sampling;
  if (!(Number.isInteger(samples) && samples >= 1)) {
    throw new RangeError(`probeSeries: samples must be a whole number from 1 up, not ${samples}`);
  }
  if (!(Number.isFinite(from) && Number.isFinite(step))) {
    throw new RangeError(`probeSeries: from and step must be finite, not ${from} and ${step}`);
  }
  const series: ProbeSeries = {
    t: new Float64Array(samples),
    ex: new Float64Array(samples),
    ey: new Float64Array(samples),
    ez: new Float64Array(samples),
    bx: new Float64Array(samples),
    by: new Float64Array(samples),
    bz: new Float64Array(samples),
    sx: new Float64Array(samples),
    sy: new Float64Array(samples),
    sz: new Float64Array(samples),
  };
  const { t, ex, ey, ez, bx, by, bz, sx, sy, sz } = series;
  const [rx, ry, rz] = point;
  const f = fieldSample();
  const s = vec3();
  for (let k = 0; k < samples; k++) {
    const time = from + k * step;
    evaluateFields(charges, rx, ry, rz, time, f);
    poyntingVector(s, f);
    t[k] = time;
    ex[k] = f.ex;
    ey[k] = f.ey;
    ez[k] = f.ez;
    bx[k] = f.bx;
    by[k] = f.by;
    bz[k] = f.bz;
    sx[k] = s.x;
    sy[k] = s.y;
    sz[k] = s.z;
  }
  return series;
}

function isPowerOfTwo(n: number): boolean {
  return Number.isInteger(n) && n >= 1 && n <= 2 ** 52 && 2 ** Math.round(Math.log2(n)) === n;
}

function nextPowerOfTwo(n: number): number {
  if (!(n < 2 ** 52)) return 2 ** 52;
  let p = 1;
  while (p < n) p *= 2;
  return p;
}

function formatCount(n: number): string {
  return Number.isInteger(n) ? String(n) : n.toPrecision(3);
}

const PREFIXES: [number, string][] = [
  [1e3, 'k'],
  [1, ''],
  [1e-3, 'm'],
  [1e-6, 'µ'],
  [1e-9, 'n'],
  [1e-12, 'p'],
  [1e-15, 'f'],
  [1e-18, 'a'],
  [1e-21, 'z'],
];

/** A value with its SI prefix, three significant digits: 1.23e-11 s → "12.3 ps". */
function si(value: number, unit: string): string {
  if (!Number.isFinite(value) || value === 0) return `${value} ${unit}`;
  const size = Math.abs(value);
  for (const [scale, prefix] of PREFIXES) {
    // Rounding to three digits first keeps 999.96 ps from showing as "1.00e+3 ps".
    const scaled = Number((size / scale).toPrecision(3));
    if (scaled >= 1 || scale === 1e-21) {
      if (scale === 1e3 && scaled >= 1000) return `${value.toPrecision(3)} ${unit}`;
      return `${Math.sign(value) * scaled} ${prefix}${unit}`;
    }
  }
  return `${value} ${unit}`;
}
