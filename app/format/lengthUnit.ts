/** A unit for lengths shown on an axis. */
export interface LengthUnit {
  symbol: string;
  /** Metres per unit. */
  metres: number;
}

const UNITS: LengthUnit[] = [
  { symbol: 'km', metres: 1e3 },
  { symbol: 'm', metres: 1 },
  { symbol: 'cm', metres: 1e-2 },
  { symbol: 'mm', metres: 1e-3 },
  { symbol: 'µm', metres: 1e-6 },
  { symbol: 'nm', metres: 1e-9 },
];

/** The largest unit in which a length (m) reads as at least `least`; 2 keeps axis ticks short. */
export function lengthUnitFor(length: number, least = 2): LengthUnit {
  return UNITS.find((unit) => length / unit.metres >= least) ?? UNITS[UNITS.length - 1];
}

/** A length in the unit lengthUnitFor picks for it, e.g. 0.2 -> "20 cm". */
export function formatLength(metres: number, digits = 3): string {
  if (metres === 0) return '0 m';
  const unit = lengthUnitFor(Math.abs(metres), 1);
  return `${Number((metres / unit.metres).toPrecision(digits))} ${unit.symbol}`;
}
