import type { FieldMap } from '../field/fieldMap';
import type { SliceCreator } from './appState';

/** What the field engine last delivered; written only by app/engine/fieldEngine. */
export interface FieldSlice {
  fieldMap: FieldMap | null;
  /** A newer map is being computed. */
  fieldPending: boolean;
  fieldError: string | null;
  /** The last worker fault, in one line, if a worker had to be replaced. */
  fieldFault: string | null;
  setFieldState(change: Partial<Omit<FieldSlice, 'setFieldState'>>): void;
}

export const createFieldSlice: SliceCreator<FieldSlice> = (set) => ({
  fieldMap: null,
  fieldPending: false,
  fieldError: null,
  fieldFault: null,
  setFieldState: (change) => set(change),
});
