import { useMemo } from 'react';
import { lightConeShells, shellSpacing } from '../field/lightConeShells';
import { formatLength } from '../format/lengthUnit';
import { formatSI } from '../format/siFormat';
import { useAppState } from '../hooks/useAppState';
import { useSliceGeometry } from '../hooks/useSliceSpec';
import { SHELL_COUNT } from '../view/ShellLines';

/** The shells in words: how often they are sent and where the newest one has got to. */
export function ShellNote() {
  const charges = useAppState((s) => s.charges);
  const selected = useAppState((s) => s.selectedCharge);
  const time = useAppState((s) => s.time);
  const spec = useSliceGeometry();
  const spacing = shellSpacing(spec);
  const newest = useMemo(() => {
    const charge = charges[selected];
    return charge ? lightConeShells(charge.path, spec, time, spacing, SHELL_COUNT)[0] : undefined;
  }, [charges, selected, spec, time, spacing]);
  return (
    <p className="muted shell-note" data-testid="shell-note">
      One shell per {formatSI(spacing, 's')} of emission time, the last {SHELL_COUNT} per charge.
      {newest &&
        ` Newest: sent at ${formatSI(newest.emitted, 's', 4)}, radius now ${formatLength(newest.radius, 4)}.`}
    </p>
  );
}
