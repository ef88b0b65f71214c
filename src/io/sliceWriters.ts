import type { SliceFields } from '../engine/slicePlanes';
import { type SliceSpec, slicePoint, type Triple } from '../engine/sliceSpec';
import { CONECAST_VERSION } from '../version';
import { encodeNpyFloat32 } from './npy';
import {
  COMPONENT_MEANINGS,
  COMPONENT_UNITS,
  componentOf,
  QUANTITIES,
  type Quantity,
} from './sliceQuantities';

/** What every slice output says about itself. */
export interface SliceDescription {
  format: 'conecast-slice';
  formatVersion: 1;
  conecast: string;
  spec: SliceSpec;
  time: number;
  nearRadius: number;
  layout: string;
  components: string[];
  units: Record<string, string>;
  meanings: Record<string, string>;
  positionUnits: 'm';
  note: string;
}

export function describeSlice(
  spec: SliceSpec,
  quantity: Quantity,
  nearRadius: number,
): SliceDescription {
  const components = [...QUANTITIES[quantity]];
  return {
    format: 'conecast-slice',
    formatVersion: 1,
    conecast: CONECAST_VERSION,
    spec,
    time: spec.time,
    nearRadius,
    layout:
      'row-major: point (i, j) at index j*nx + i; position center + ((i+0.5)/nx-0.5)*width*u + ((j+0.5)/ny-0.5)*height*v',
    components,
    units: Object.fromEntries(components.map((c) => [c, COMPONENT_UNITS[c]])),
    meanings: Object.fromEntries(components.map((c) => [c, COMPONENT_MEANINGS[c]])),
    positionUnits: 'm',
    note: 'SI units; fields are zero where on_charge = 1 (within nearRadius m of a charge, or so near one that E or S would exceed float32).',
  };
}

/** .npy of shape ny × nx × components (float32, C order), plus its description as JSON. */
export function sliceToNpy(
  fields: SliceFields,
  spec: SliceSpec,
  quantity: Quantity,
  nearRadius: number,
): { npy: Uint8Array; sidecar: string } {
  const components = QUANTITIES[quantity];
  const columns = components.map((c) => componentOf(fields, c));
  const n = spec.nx * spec.ny;
  const k = components.length;
  const data = new Float32Array(n * k);
  for (let p = 0; p < n; p++) {
    for (let c = 0; c < k; c++) data[p * k + c] = columns[c][p];
  }
  const description = describeSlice(spec, quantity, nearRadius);
  return {
    npy: encodeNpyFloat32(data, [spec.ny, spec.nx, k]),
    sidecar: `${JSON.stringify({ ...description, shape: [spec.ny, spec.nx, k] }, null, 2)}\n`,
  };
}

/** CSV: '#' lines describing the slice, then a header row x,y,z,<components>, a row per point. */
export function sliceToCsv(
  fields: SliceFields,
  spec: SliceSpec,
  quantity: Quantity,
  nearRadius: number,
): string {
  const description = describeSlice(spec, quantity, nearRadius);
  const components = description.components;
  const columns = (components as (typeof QUANTITIES.all)[number][]).map((c) =>
    componentOf(fields, c),
  );
  const lines: string[] = [
    `# conecast ${CONECAST_VERSION} slice; time ${spec.time} s; ${spec.nx} x ${spec.ny} points`,
    `# spec ${JSON.stringify(spec)}`,
    `# units x,y,z m; ${components.map((c) => `${c} ${description.units[c]}`).join('; ')}`,
    `# rows in order j*nx + i; fields are 0 where on_charge (within ${nearRadius} m of a charge, or so near one that E or S would exceed float32)`,
    ['x', 'y', 'z', ...components].join(','),
  ];
  const point: Triple = [0, 0, 0];
  for (let j = 0; j < spec.ny; j++) {
    for (let i = 0; i < spec.nx; i++) {
      slicePoint(spec, i, j, point);
      const p = j * spec.nx + i;
      let line = `${point[0]},${point[1]},${point[2]}`;
      for (let c = 0; c < columns.length; c++) line += `,${columns[c][p]}`;
      lines.push(line);
    }
  }
  return `${lines.join('\n')}\n`;
}

/** JSON: the description plus one array per component (row-major j*nx + i). */
export function sliceToJson(
  fields: SliceFields,
  spec: SliceSpec,
  quantity: Quantity,
  nearRadius: number,
): string {
  const description = describeSlice(spec, quantity, nearRadius);
  const data: Record<string, number[]> = {};
  for (const c of QUANTITIES[quantity]) data[c] = Array.from(componentOf(fields, c));
  return `${JSON.stringify({ ...description, nx: spec.nx, ny: spec.ny, data })}\n`;
}
