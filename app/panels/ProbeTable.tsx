import type { ProbeReadout } from '../../src/analysis/probeReadout';
import type { Triple } from '../../src/engine/sliceSpec';
import { formatSI } from '../format/siFormat';

const DIGITS = 5;

/** A number with its unit; the exact double rides along in data-value for scripts and tests. */
function Value({ value, unit, name }: { value: number; unit: string; name: string }) {
  return (
    <dd data-quantity={name} data-value={String(value)}>
      {formatSI(value, unit, DIGITS)}
    </dd>
  );
}

function VectorBlock({
  label,
  name,
  vector,
  unit,
}: {
  label: string;
  name: string;
  vector: Triple;
  unit: string;
}) {
  return (
    <div className="vector-block">
      <div className="vector-label">{label}</div>
      <dl className="vector-values">
        <dt>x</dt>
        <Value value={vector[0]} unit={unit} name={`${name}x`} />
        <dt>y</dt>
        <Value value={vector[1]} unit={unit} name={`${name}y`} />
        <dt>z</dt>
        <Value value={vector[2]} unit={unit} name={`${name}z`} />
        <dt>|{name.split('_')[0]}|</dt>
        <Value value={Math.hypot(...vector)} unit={unit} name={`|${name}|`} />
      </dl>
    </div>
  );
}

/** E, B and S at a probe, split into bound and radiated parts, with the Feynman cross-check. */
export function ProbeTable({ readout, time }: { readout: ProbeReadout; time: number }) {
  return (
    <div className="probe-readout" data-testid="probe-readout">
      {readout.onCharge && (
        <p className="field-problem" role="status">
          The probe sits on a charge: the field is not defined there and shows as zero.
        </p>
      )}
      <p className="probe-time">At t = {formatSI(time, 's', 6)}</p>
      <VectorBlock label="E" name="E" vector={readout.e} unit="V/m" />
      <VectorBlock label="B" name="B" vector={readout.b} unit="T" />
      <VectorBlock label="S (Poynting)" name="S" vector={readout.s} unit="W/m²" />
      <VectorBlock label="E, velocity part" name="E_vel" vector={readout.eVelocity} unit="V/m" />
      <VectorBlock label="E, radiation part" name="E_rad" vector={readout.eRadiation} unit="V/m" />
      <VectorBlock label="B, velocity part" name="B_vel" vector={readout.bVelocity} unit="T" />
      <VectorBlock label="B, radiation part" name="B_rad" vector={readout.bRadiation} unit="T" />
      <VectorBlock label="E by Feynman’s formula" name="E_F" vector={readout.feynmanE} unit="V/m" />
      <VectorBlock label="B by Feynman’s formula" name="B_F" vector={readout.feynmanB} unit="T" />
      <p className="cross-check" data-testid="cross-check">
        Feynman’s formula against Liénard–Wiechert: relative difference{' '}
        <span data-value={String(readout.relativeDifference.e)}>
          {readout.relativeDifference.e.toExponential(2)}
        </span>{' '}
        in E,{' '}
        <span data-value={String(readout.relativeDifference.b)}>
          {readout.relativeDifference.b.toExponential(2)}
        </span>{' '}
        in B.
      </p>
      <table className="vector-table">
        <caption>Seen from the probe, per charge</caption>
        <thead>
          <tr>
            <th scope="col">charge</th>
            <th scope="col">t_ret</th>
            <th scope="col">t − t_ret</th>
            <th scope="col">1 − n·β</th>
            <th scope="col">distance</th>
          </tr>
        </thead>
        <tbody>
          {readout.charges.map((charge, k) => (
            // biome-ignore lint/suspicious/noArrayIndexKey: charges are identified by their order
            <tr key={k}>
              <th scope="row">{k + 1}</th>
              <td data-quantity="t_ret" data-value={String(charge.tRet)}>
                {formatSI(charge.tRet, 's', DIGITS)}
              </td>
              <td data-quantity="delay" data-value={String(charge.delay)}>
                {formatSI(charge.delay, 's', DIGITS)}
              </td>
              <td data-quantity="doppler" data-value={String(charge.doppler)}>
                {charge.doppler.toPrecision(DIGITS)}
              </td>
              <td data-quantity="distance" data-value={String(charge.distance)}>
                {formatSI(charge.distance, 'm', DIGITS)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
