import type { Triple } from '../../src/engine/sliceSpec';
import { pathState } from '../../src/path/pathState';
import type { Charge } from '../../src/physics/charge';
import { retardedSolution, solveRetardedTime } from '../../src/physics/retardedTime';

const state = pathState();
const solution = retardedSolution();

/** Where each charge was when it sent the light reaching `point` at `time`, m, with that instant, s. */
export function retardedPositions(
  charges: readonly Charge[],
  point: Triple,
  time: number,
): { position: Triple; tRet: number }[] {
  return charges.map(({ path }) => {
    solveRetardedTime(path, point[0], point[1], point[2], time, state, solution);
    return { position: [state.px, state.py, state.pz], tRet: solution.tRet };
  });
}
