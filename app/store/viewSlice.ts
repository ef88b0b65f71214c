import { NAMED_PLANES, type PlaneName, type Triple } from '../../src/engine/sliceSpec';
import type { ScenarioView } from '../../src/io/scenario';
import type { SliceCreator } from './appState';

export type ViewMode = '2d' | '3d';

/** Camera around the slice centre in the 3D mode: angles in radians, distance in slice widths. */
export interface OrbitCamera {
  azimuth: number;
  elevation: number;
  distance: number;
}

/** Index of the coordinate axis normal to each named plane (its offset is that coordinate). */
export const NORMAL_AXIS: Record<PlaneName, 0 | 1 | 2> = { xy: 2, xz: 1, yz: 0 };

/** Smallest and largest slice width allowed, m: nanometres to kilometres. */
export const SIZE_LIMITS = { min: 1e-10, max: 1e5 } as const;

/** Where the slice lies and how finely it is sampled; the time lives in the time slice. */
export interface ViewSlice {
  plane: PlaneName;
  /** Centre of the slice, m. */
  center: Triple;
  /** Width and height, m. */
  size: [number, number];
  /** Grid points along width and height. */
  resolution: [number, number];
  viewMode: ViewMode;
  orbit: OrbitCamera;
  showView(view: Omit<ScenarioView, 'time'>): void;
  /** Turns the slice to another plane through the same centre. */
  setPlane(plane: PlaneName): void;
  /** Moves the slice along its normal: the coordinate that is constant on it, m. */
  setOffset(offset: number): void;
  /** Shifts the slice within its plane by (da, db) along u and v, m. */
  panBy(da: number, db: number): void;
  /** Scales the slice by `factor` about the in-plane point (a, b) (m from the centre) so it stays put. */
  zoomAbout(factor: number, a: number, b: number): void;
  /** Grid points along the longer side; the other follows the aspect ratio. */
  setResolution(longSide: number): void;
  setViewMode(mode: ViewMode): void;
  setOrbit(change: Partial<OrbitCamera>): void;
}

export const createViewSlice: SliceCreator<ViewSlice> = (set, get) => ({
  plane: 'xy',
  center: [0, 0, 0],
  size: [0.2, 0.2],
  resolution: [64, 64],
  viewMode: '2d',
  orbit: { azimuth: -0.6, elevation: 0.55, distance: 1.8 },
  showView: (view) =>
    set({
      plane: view.plane,
      center: [...view.center],
      size: [...view.size],
      resolution: [...view.resolution],
    }),
  setPlane: (plane) => set({ plane }),
  setOffset: (offset) => {
    if (!Number.isFinite(offset)) return;
    const center: Triple = [...get().center];
    center[NORMAL_AXIS[get().plane]] = offset;
    set({ center });
  },
  panBy: (da, db) => {
    const { plane, center } = get();
    const { u, v } = NAMED_PLANES[plane];
    const next = center.map((c, k) => c + da * u[k] + db * v[k]) as Triple;
    if (next.every(Number.isFinite)) set({ center: next });
  },
  zoomAbout: (factor, a, b) => {
    const { size } = get();
    const width = size[0] * factor;
    if (!(factor > 0) || width < SIZE_LIMITS.min || width > SIZE_LIMITS.max) return;
    get().panBy(a * (1 - factor), b * (1 - factor));
    set({ size: [width, size[1] * factor] });
  },
  setResolution: (longSide) => {
    const [width, height] = get().size;
    const short = Math.max(
      1,
      Math.round((longSide * Math.min(width, height)) / Math.max(width, height)),
    );
    set({ resolution: width >= height ? [longSide, short] : [short, longSide] });
  },
  setViewMode: (viewMode) => set({ viewMode }),
  setOrbit: (change) => set((state) => ({ orbit: { ...state.orbit, ...change } })),
});
