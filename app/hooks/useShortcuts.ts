import { useEffect } from 'react';
import { appStore } from '../store/appStore';

/** True when a key press belongs to a text box or list, not to the app's shortcuts. */
function typingInto(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  return target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName);
}

/** Undo/redo, play/pause and tool keys for the whole page. */
export function useShortcuts(): void {
  useEffect(() => {
    const onKeyDown = (event: KeyboardEvent) => {
      const state = appStore.getState();
      const command = event.ctrlKey || event.metaKey;
      if (command && event.key.toLowerCase() === 'z' && !typingInto(event.target)) {
        event.preventDefault();
        if (event.shiftKey) state.redo();
        else state.undo();
        return;
      }
      if (command && event.key.toLowerCase() === 'y' && !typingInto(event.target)) {
        event.preventDefault();
        state.redo();
        return;
      }
      if (command || event.altKey || typingInto(event.target)) return;
      if (event.key === ' ' && !(event.target instanceof HTMLButtonElement)) {
        event.preventDefault();
        state.setPlaying(!state.playing);
      } else if (state.viewMode === '2d') {
        const tool = { v: 'navigate', d: 'sketch', p: 'probe' }[event.key.toLowerCase()];
        if (tool) state.setTool(tool as 'navigate' | 'sketch' | 'probe');
      }
    };
    window.addEventListener('keydown', onKeyDown);
    return () => window.removeEventListener('keydown', onKeyDown);
  }, []);
}
