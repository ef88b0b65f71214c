import { NAMED_PLANES, type SliceSpec, type Triple } from '../engine/sliceSpec';
import { UsageError } from './usageError';
import { parseNumberOption } from './values';

/** `X,Y,Z` (or `W,H` with count 2) as finite numbers, naming the option on error. */
export function parseList(text: string, option: string, count: number, what: string): number[] {
  const parts = text.split(',');
  if (parts.length !== count) {
    throw new UsageError(
      `option ${option} needs ${count} comma-separated numbers (${what}), got "${text}"`,
    );
  }
  return parts.map((part) => parseNumberOption(part, option, `${count} numbers (${what})`));
}

/**
 * The slice geometry from --plane, --center, --size and --res. A custom plane is
 * `ORIGIN;U;V` (three triples): the plane through ORIGIN spanned by U and V, which are
 * normalised and must be orthogonal; --center, when given, is moved onto that plane.
 */
export function sliceGeometry(
  plane: string,
  centerText: string | undefined,
  sizeText: string,
  resText: string,
  time: number,
): SliceSpec {
  let u: Triple;
  let v: Triple;
  let center: Triple =
    centerText === undefined
      ? [0, 0, 0]
      : (parseList(centerText, '--center', 3, 'X,Y,Z in m') as Triple);
  if (Object.hasOwn(NAMED_PLANES, plane)) {
    const named = NAMED_PLANES[plane as keyof typeof NAMED_PLANES];
    u = [...named.u];
    v = [...named.v];
  } else {
    const parts = plane.split(';');
    if (parts.length !== 3) {
      throw new UsageError(
        `option --plane needs xy, xz, yz or ORIGIN;U;V (three X,Y,Z triples), got "${plane}"`,
      );
    }
    const origin = parseList(parts[0], '--plane', 3, 'ORIGIN as X,Y,Z in m') as Triple;
    u = unit(parseList(parts[1], '--plane', 3, 'U as X,Y,Z') as Triple, 'U');
    v = unit(parseList(parts[2], '--plane', 3, 'V as X,Y,Z') as Triple, 'V');
    const dot = u[0] * v[0] + u[1] * v[1] + u[2] * v[2];
    if (Math.abs(dot) > 1e-9) {
      throw new UsageError(
        `option --plane: U and V must be orthogonal (U·V = ${dot.toPrecision(3)} after normalising)`,
      );
    }
    if (centerText === undefined) center = origin;
    else {
      const n: Triple = [
        u[1] * v[2] - u[2] * v[1],
        u[2] * v[0] - u[0] * v[2],
        u[0] * v[1] - u[1] * v[0],
      ];
      const off =
        (center[0] - origin[0]) * n[0] +
        (center[1] - origin[1]) * n[1] +
        (center[2] - origin[2]) * n[2];
      center = [center[0] - off * n[0], center[1] - off * n[1], center[2] - off * n[2]];
    }
  }
  const [width, height] = parseList(sizeText, '--size', 2, 'W,H in m');
  if (!(width > 0 && height > 0))
    throw new UsageError(`option --size needs two positive lengths in m, got "${sizeText}"`);
  const res = parseList(resText, '--res', 2, 'NX,NY grid points');
  if (!res.every((n) => Number.isInteger(n) && n >= 1 && n <= 8192)) {
    throw new UsageError(`option --res needs two whole numbers from 1 to 8192, got "${resText}"`);
  }
  return { center, u, v, width, height, nx: res[0], ny: res[1], time };
}

function unit(a: Triple, name: string): Triple {
  const length = Math.hypot(a[0], a[1], a[2]);
  if (!(length > 0)) throw new UsageError(`option --plane: axis ${name} must not be zero`);
  return [a[0] / length, a[1] / length, a[2] / length];
}
