import { useState } from 'react';
import { scenarioCaption } from '../export/caption';
import { type PictureBackground, renderPicture } from '../export/renderPicture';
import { displayedMap } from '../field/displayedMap';
import { useAppState } from '../hooks/useAppState';
import { download, fileStem } from '../io/download';
import { appStore } from '../store/appStore';

const WIDTHS = [1200, 1800, 2400, 3600];

/** The map as a picture for a report: drawn afresh at the width asked for. */
export function PictureExport() {
  const ready = useAppState((s) => s.fieldMap !== null && !s.fieldMap.coarse && !s.fieldPending);
  const [width, setWidth] = useState(1800);
  const [background, setBackground] = useState<PictureBackground>('light');
  const [problem, setProblem] = useState<string | null>(null);
  const save = () => {
    const state = appStore.getState();
    const shown = displayedMap(state.fieldMap, state.display);
    if (shown === null || state.scenario === null) return;
    const canvas = renderPicture({
      shown,
      charges: shown.map.charges,
      probes: state.probes,
      caption: scenarioCaption(state.scenario),
      title: state.scenario.title,
      width,
      background,
      shells: state.shells,
    });
    canvas.toBlob((blob) => {
      if (blob === null) {
        setProblem(`the browser could not make a ${width}-pixel-wide PNG`);
        return;
      }
      setProblem(null);
      void blob
        .arrayBuffer()
        .then((bytes) =>
          download(
            `${fileStem(state.scenario?.title ?? 'map')}-map.png`,
            new Uint8Array(bytes),
            'image/png',
          ),
        );
    }, 'image/png');
  };
  return (
    <div className="picture-export">
      <div className="field-row">
        <span>Picture</span>
        <select
          aria-label="Picture width"
          value={width}
          onChange={(e) => setWidth(Number(e.currentTarget.value))}
        >
          {WIDTHS.map((w) => (
            <option key={w} value={w}>
              {w} px wide
            </option>
          ))}
        </select>
        <select
          aria-label="Picture background"
          value={background}
          onChange={(e) => setBackground(e.currentTarget.value as PictureBackground)}
        >
          <option value="light">light</option>
          <option value="dark">dark</option>
        </select>
      </div>
      <button type="button" disabled={!ready} onClick={save}>
        Save picture (PNG)
      </button>
      {problem && (
        <p className="field-problem" role="alert">
          Picture not saved: {problem}
        </p>
      )}
    </div>
  );
}
