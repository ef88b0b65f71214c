import { useThree } from '@react-three/fiber';
import { useLayoutEffect } from 'react';
import type { OrthographicCamera, PerspectiveCamera } from 'three';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import type { OrbitCamera } from '../store/viewSlice';
import { planeNormal } from './viewGeometry';

/** 2D: looks straight down the slice normal, v up, zoomed so the slice fills the canvas. */
export function TopDownCamera({ spec }: { spec: SliceSpec }) {
  const camera = useThree((s) => s.camera) as OrthographicCamera;
  const size = useThree((s) => s.size);
  const invalidate = useThree((s) => s.invalidate);
  useLayoutEffect(() => {
    const n = planeNormal(spec);
    // Far enough along the normal that paths well off the plane are still inside the frustum.
    const distance = 1000 * Math.max(spec.width, spec.height);
    camera.position.set(n[0] * distance, n[1] * distance, n[2] * distance);
    camera.up.set(...spec.v);
    camera.lookAt(0, 0, 0);
    camera.near = distance * 1e-3;
    camera.far = distance * 2;
    camera.zoom = Math.min(size.width / spec.width, size.height / spec.height);
    camera.updateProjectionMatrix();
    invalidate();
  }, [camera, size, spec, invalidate]);
  return null;
}

/** 3D: a perspective camera orbiting the slice centre; the slice normal is up. */
export function OrbitingCamera({ spec, orbit }: { spec: SliceSpec; orbit: OrbitCamera }) {
  const camera = useThree((s) => s.camera) as PerspectiveCamera;
  const invalidate = useThree((s) => s.invalidate);
  useLayoutEffect(() => {
    const { u, v } = spec;
    const n = planeNormal(spec);
    const distance = orbit.distance * Math.max(spec.width, spec.height);
    const flat = Math.cos(orbit.elevation);
    const su = flat * Math.sin(orbit.azimuth);
    const sv = -flat * Math.cos(orbit.azimuth);
    const sn = Math.sin(orbit.elevation);
    camera.position.set(
      distance * (su * u[0] + sv * v[0] + sn * n[0]),
      distance * (su * u[1] + sv * v[1] + sn * n[1]),
      distance * (su * u[2] + sv * v[2] + sn * n[2]),
    );
    camera.up.set(...n);
    camera.lookAt(0, 0, 0);
    camera.near = distance * 1e-3;
    camera.far = distance * 1e3;
    camera.fov = 40;
    camera.updateProjectionMatrix();
    invalidate();
  }, [camera, spec, orbit, invalidate]);
  return null;
}
