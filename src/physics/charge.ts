import type { SampledPath } from '../path/sampledPath';

/** A point charge (C) moving on a path. */
export interface Charge {
  charge: number;
  path: SampledPath;
}
