import { useThree } from '@react-three/fiber';
import { useEffect, useImperativeHandle, useMemo, type Ref } from 'react';
import { PerspectiveCamera, Vector3, type Camera } from 'three';
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js';
import type { SectionView } from '../../lib/section-view';

/** Camera moves the toolbar buttons make, so everything works without a mouse. */
export interface CameraCommands {
  /** Back to the starting view, or square onto the cut again in the section view. */
  reset(): void;
  turn(degrees: number): void;
  zoom(factor: number): void;
}

interface CameraRigProps {
  /** Largest size of the face, mm: sets the starting distance. */
  size: number;
  ref?: Ref<CameraCommands>;
  /** Element that takes the arrow keys for panning (the focusable frame around the canvas). */
  keyTarget: HTMLElement | null;
  /** The section view's cut: the camera looks square onto it whenever it changes. */
  section: SectionView | null;
}

const home = (size: number) => new Vector3(size * 0.85, -size * 1.35, size * 1.05);

/**
 * The distance from which a camera with this vertical field of view and aspect fits `width` × `height` mm, with
 * a tenth spare around it.
 */
function fitDistance(camera: PerspectiveCamera, width: number, height: number): number {
  const tan = Math.tan((camera.fov * Math.PI) / 360);
  return 1.1 * Math.max(height / 2 / tan, width / 2 / (tan * camera.aspect));
}

type Frame = Pick<SectionView, 'x' | 'y' | 'z' | 'width' | 'height'>;

/** Puts the camera at its starting place, or square onto the section's cut (from −y) when there is one. */
function aim(camera: Camera, controls: OrbitControls, size: number, frame: Frame | null): void {
  if (frame) {
    const d = camera instanceof PerspectiveCamera ? fitDistance(camera, frame.width, frame.height) : 4 * frame.height;
    camera.position.set(frame.x, frame.y - d, frame.z);
    controls.target.set(frame.x, frame.y, frame.z);
  } else {
    camera.position.copy(home(size));
    controls.target.set(0, 0, 0);
  }
  controls.update();
}

/** Orbit (drag), pan (right-drag or arrow keys), zoom (wheel or pinch) and the toolbar's camera moves. */
export function CameraRig({ size, ref, keyTarget, section }: CameraRigProps) {
  const { camera, gl, invalidate } = useThree();
  const controls = useMemo(() => new OrbitControls(camera, gl.domElement), [camera, gl]);

  useEffect(() => {
    controls.enableDamping = false;
    controls.screenSpacePanning = true;
    const onChange = () => invalidate();
    controls.addEventListener('change', onChange);
    return () => {
      controls.removeEventListener('change', onChange);
      controls.dispose();
    };
  }, [controls, invalidate]);

  useEffect(() => {
    if (!keyTarget) return;
    controls.listenToKeyEvents(keyTarget);
    return () => controls.stopListenToKeyEvents();
  }, [controls, keyTarget]);

  // Square onto the cut from the −y side, framing the key or rail; back home when the section view ends. Only a
  // changed cut or face size moves the camera, so a rebuild that keeps the layout keeps the user's own view.
  const { x, y, z, width, height } = section ?? {};
  const frame = useMemo(
    () =>
      x === undefined || y === undefined || z === undefined || width === undefined || height === undefined
        ? null
        : { x, y, z, width, height },
    [x, y, z, width, height],
  );
  useEffect(() => aim(camera, controls, size, frame), [camera, controls, size, frame]);

  useImperativeHandle(
    ref,
    () => ({
      reset() {
        aim(camera, controls, size, frame);
      },
      turn(degrees) {
        const offset = camera.position.clone().sub(controls.target);
        offset.applyAxisAngle(new Vector3(0, 0, 1), (degrees * Math.PI) / 180);
        camera.position.copy(controls.target).add(offset);
        controls.update();
      },
      zoom(factor) {
        const offset = camera.position.clone().sub(controls.target).multiplyScalar(factor);
        camera.position.copy(controls.target).add(offset);
        controls.update();
      },
    }),
    [camera, controls, size, frame],
  );
  return null;
}
