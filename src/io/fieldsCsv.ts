import type { FieldSample } from '../physics/fieldSample';
import type { Vec3 } from '../physics/vec3';

/** Output columns of a field table: m, s, V/m, T, V/m, W/m², then 0/1. */
export const FIELDS_HEADER =
  'x,y,z,t,t_ret,Ex,Ey,Ez,Bx,By,Bz,Ex_rad,Ey_rad,Ez_rad,Sx,Sy,Sz,on_charge';

/** One output row (no line end), every number in shortest round-trip form. */
export function fieldsRow(
  x: number,
  y: number,
  z: number,
  t: number,
  f: FieldSample,
  s: Vec3,
): string {
  return (
    `${x},${y},${z},${t},${f.tRet},${f.ex},${f.ey},${f.ez},${f.bx},${f.by},${f.bz},` +
    `${f.erx},${f.ery},${f.erz},${s.x},${s.y},${s.z},${f.onCharge ? 1 : 0}`
  );
}
