import { useStore } from 'zustand';
import type { AppState } from '../store/appState';
import { appStore } from '../store/appStore';

/** A piece of the app state; the component re-renders only when that piece changes. */
export function useAppState<T>(selector: (state: AppState) => T): T {
  return useStore(appStore, selector);
}
