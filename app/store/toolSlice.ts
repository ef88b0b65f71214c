import type { SketchSpeed } from '../../src/path/sketchPath';
import type { SliceCreator } from './appState';

/** What a press on the slice does: look around, draw a path, or place a probe. */
export type PointerTool = 'navigate' | 'sketch' | 'probe';

export interface ToolSlice {
  tool: PointerTool;
  /** How the next sketched path is travelled. */
  sketchSpeed: SketchSpeed;
  setTool(tool: PointerTool): void;
  setSketchSpeed(speed: SketchSpeed): void;
}

export const createToolSlice: SliceCreator<ToolSlice> = (set) => ({
  tool: 'navigate',
  sketchSpeed: { kind: 'constant', beta: 0.9 },
  setTool: (tool) => set({ tool }),
  setSketchSpeed: (sketchSpeed) => set({ sketchSpeed }),
});
