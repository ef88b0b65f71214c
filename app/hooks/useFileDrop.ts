import { useEffect } from 'react';
import { openScenarioFile } from '../io/openScenarioFile';
import { startPathImport } from '../io/pathImport';

/** A file dropped anywhere on the page: a .json opens as a scenario, anything else as a path. */
export function useFileDrop(): void {
  useEffect(() => {
    const onDragOver = (event: DragEvent) => {
      if (event.dataTransfer?.types.includes('Files')) event.preventDefault();
    };
    const onDrop = (event: DragEvent) => {
      const file = event.dataTransfer?.files[0];
      if (file === undefined) return;
      event.preventDefault();
      if (/\.json$/i.test(file.name)) void openScenarioFile(file);
      else startPathImport(file);
    };
    window.addEventListener('dragover', onDragOver);
    window.addEventListener('drop', onDrop);
    return () => {
      window.removeEventListener('dragover', onDragOver);
      window.removeEventListener('drop', onDrop);
    };
  }, []);
}
