import { useState } from 'react';
import { scenarioCaption } from '../export/caption';
import { pictureMap } from '../export/pictureMap';
import { type PictureBackground, plotWidthOf, renderPicture } from '../export/renderPicture';
import { displayedMap, displayMap } from '../field/displayedMap';
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
  const [computing, setComputing] = useState(false);
  const save = async () => {
    const state = appStore.getState();
    const onScreen = displayedMap(state.fieldMap, state.display);
    if (onScreen === null || state.scenario === null) return;
    // The map is computed again on the picture's own, finer grid, and painted with the
    // colours on screen (their range held), so the picture shows what was seen, sharper.
    setComputing(true);
    let fine: Awaited<ReturnType<typeof pictureMap>>;
    try {
      fine = await pictureMap(onScreen.map, plotWidthOf(width));
    } finally {
      setComputing(false);
    }
    const held = onScreen.scale
      ? { ...state.display, range: { min: onScreen.scale.min, max: onScreen.scale.max } }
      : state.display;
    const shown = displayMap(fine, held);
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
      <button type="button" disabled={!ready || computing} onClick={() => void save()}>
        Save picture (PNG)
      </button>
      {computing && (
        <p className="muted" role="status">
          Computing the picture's map on its own grid…
        </p>
      )}
      {problem && (
        <p className="field-problem" role="alert">
          Picture not saved: {problem}
        </p>
      )}
    </div>
  );
}
