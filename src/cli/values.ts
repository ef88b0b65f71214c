import { type ScannedNumber, scanNumber } from '../io/scanNumber';
import { ELEMENTARY_CHARGE } from '../physics/constants';
import { UsageError } from './usageError';

const scanned: ScannedNumber = { value: 0 };

/** A finite decimal number given to `option`, in the same notation as the CSV files. */
export function parseNumberOption(text: string, option: string, expected = 'a number'): number {
  const trimmed = text.trim();
  if (trimmed === '' || scanNumber(trimmed, 0, trimmed.length, scanned) !== trimmed.length) {
    throw new UsageError(`option ${option} needs ${expected}, got "${text}"`);
  }
  if (!Number.isFinite(scanned.value)) {
    throw new UsageError(`option ${option}: number out of range: "${text}"`);
  }
  return scanned.value;
}

/** A charge in coulombs, or `e` / `+e` / `-e` for ± the elementary charge. */
export function parseCharge(text: string, option: string): number {
  const trimmed = text.trim();
  if (trimmed === 'e' || trimmed === '+e') return ELEMENTARY_CHARGE;
  if (trimmed === '-e') return -ELEMENTARY_CHARGE;
  return parseNumberOption(text, option, 'a charge in coulombs, or e or -e');
}
