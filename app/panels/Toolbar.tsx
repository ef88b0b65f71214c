import { useAppState } from '../hooks/useAppState';
import type { PointerTool } from '../store/toolSlice';
import { SketchSpeedControls } from './SketchSpeedControls';

const TOOLS: { tool: PointerTool; label: string; hint: string; key: string }[] = [
  { tool: 'navigate', label: 'Move view', hint: 'drag to pan, wheel to zoom', key: 'V' },
  {
    tool: 'sketch',
    label: 'Draw path',
    hint: 'press and drag to draw the selected charge’s path',
    key: 'D',
  },
  { tool: 'probe', label: 'Place probe', hint: 'click to place a probe', key: 'P' },
];

/** What the pointer does on the slice, 2D or 3D, and undo/redo. */
export function Toolbar() {
  const tool = useAppState((s) => s.tool);
  const setTool = useAppState((s) => s.setTool);
  const mode = useAppState((s) => s.viewMode);
  const setViewMode = useAppState((s) => s.setViewMode);
  const past = useAppState((s) => s.past);
  const future = useAppState((s) => s.future);
  const undo = useAppState((s) => s.undo);
  const redo = useAppState((s) => s.redo);
  const active = TOOLS.find((entry) => entry.tool === tool);

  return (
    <div className="toolbar">
      <fieldset className="segmented">
        <legend className="visually-hidden">Pointer tool</legend>
        {TOOLS.map((entry) => (
          <button
            key={entry.tool}
            type="button"
            aria-pressed={tool === entry.tool}
            aria-keyshortcuts={entry.key}
            disabled={mode === '3d'}
            title={`${entry.label} (${entry.key}): ${entry.hint}`}
            onClick={() => setTool(entry.tool)}
          >
            {entry.label}
          </button>
        ))}
      </fieldset>
      <fieldset className="segmented">
        <legend className="visually-hidden">View</legend>
        {(['2d', '3d'] as const).map((choice) => (
          <button
            key={choice}
            type="button"
            aria-pressed={mode === choice}
            onClick={() => setViewMode(choice)}
          >
            {choice === '2d' ? 'Top-down 2D' : 'Orbit 3D'}
          </button>
        ))}
      </fieldset>
      <div className="toolbar-group">
        <button
          type="button"
          onClick={undo}
          disabled={past.length === 0}
          aria-keyshortcuts="Control+Z"
          title={past.length ? `Undo: ${past[past.length - 1].label}` : 'Nothing to undo'}
        >
          Undo
        </button>
        <button
          type="button"
          onClick={redo}
          disabled={future.length === 0}
          aria-keyshortcuts="Control+Shift+Z"
          title={future.length ? `Redo: ${future[future.length - 1].label}` : 'Nothing to redo'}
        >
          Redo
        </button>
      </div>
      <p className="toolbar-hint" aria-live="polite">
        {mode === '3d'
          ? 'Drag to orbit, wheel to move closer; editing works in the 2D view.'
          : active?.hint}
      </p>
      {tool === 'sketch' && mode === '2d' && <SketchSpeedControls />}
    </div>
  );
}
