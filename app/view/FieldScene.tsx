import type { SliceSpec } from '../../src/engine/sliceSpec';
import { usePatternSourceTime } from '../analysis/PatternView';
import type { DisplayedMap } from '../field/displayedMap';
import { shellSpacing } from '../field/lightConeShells';
import { useAppState } from '../hooks/useAppState';
import { ArrowField } from './ArrowField';
import { ChargeMarkers } from './ChargeMarkers';
import { ChargePaths } from './ChargePaths';
import { FieldPlane } from './FieldPlane';
import { PatternSphere } from './PatternSphere';
import { ProbeMarkers } from './ProbeMarkers';
import { OrbitingCamera, TopDownCamera } from './SceneCamera';
import { ShellLines } from './ShellLines';
import { SliceFrame } from './SliceFrame';

interface FieldSceneProps {
  spec: SliceSpec;
  shown: DisplayedMap | null;
  onDrawn(id: number, time: number): void;
}

/** What the canvas draws; the scene origin is the centre of the slice in view. */
export function FieldScene({ spec, shown, onDrawn }: FieldSceneProps) {
  const charges = useAppState((s) => s.charges);
  const selectedCharge = useAppState((s) => s.selectedCharge);
  const probes = useAppState((s) => s.probes);
  const storeTime = useAppState((s) => s.time);
  // Everything is drawn at the instant of the map on screen, so the picture is one instant and
  // the canvas redraws only when a map arrives, not at every move of the time slider.
  const time = shown?.map.spec.time ?? storeTime;
  const arrows = useAppState((s) => s.arrows);
  const shells = useAppState((s) => s.shells);
  const mode = useAppState((s) => s.viewMode);
  const orbit = useAppState((s) => s.orbit);
  const showSphere = useAppState(
    (s) => s.viewMode === '3d' && s.analysisTab === 'pattern' && s.patternSphere,
  );
  const patternPer = useAppState((s) => s.patternPer);
  const patternTime = usePatternSourceTime();
  const origin = spec.center;
  const markerRadius = 0.011 * Math.min(spec.width, spec.height);

  return (
    <>
      {mode === '2d' ? <TopDownCamera spec={spec} /> : <OrbitingCamera spec={spec} orbit={orbit} />}
      {shown && (
        <SliceFrame spec={shown.map.spec} origin={origin}>
          <FieldPlane
            map={shown.map}
            quantity={shown.quantity}
            scale={shown.scale}
            onDrawn={onDrawn}
          />
        </SliceFrame>
      )}
      {shown && arrows !== 'off' && (
        <ArrowField map={shown.map} quantity={arrows} origin={origin} />
      )}
      {shells && (
        <ShellLines
          spec={spec}
          charges={charges}
          time={time}
          spacing={shellSpacing(spec)}
          mode={mode}
        />
      )}
      <ChargePaths origin={origin} charges={charges} selected={selectedCharge} />
      <ProbeMarkers
        origin={origin}
        probes={probes}
        charges={charges}
        time={time}
        radius={markerRadius}
      />
      <ChargeMarkers origin={origin} charges={charges} radius={markerRadius} time={time} />
      {showSphere && charges[selectedCharge] && patternTime !== null && (
        <PatternSphere
          charge={charges[selectedCharge]}
          sourceTime={patternTime}
          per={patternPer}
          origin={origin}
          radius={0.2 * Math.min(spec.width, spec.height)}
        />
      )}
    </>
  );
}
