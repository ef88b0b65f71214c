import { useThree } from '@react-three/fiber';
import { useLayoutEffect } from 'react';

/** Looks straight down on the slice and zooms the orthographic camera so the slice fills the canvas. */
export function SliceCamera({ width, height }: { width: number; height: number }) {
  const camera = useThree((s) => s.camera);
  const size = useThree((s) => s.size);
  const invalidate = useThree((s) => s.invalidate);
  useLayoutEffect(() => {
    camera.position.set(0, 0, 1);
    camera.up.set(0, 1, 0);
    camera.lookAt(0, 0, 0);
    camera.zoom = Math.min(size.width / width, size.height / height);
    camera.updateProjectionMatrix();
    invalidate();
  }, [camera, size, width, height, invalidate]);
  return null;
}
