import { useThree } from '@react-three/fiber';
import { useEffect, useImperativeHandle, useMemo, type Ref } from 'react';
import { Vector3 } from 'three';
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js';

/** Camera moves the toolbar buttons make, so everything works without a mouse. */
export interface CameraCommands {
  reset(): void;
  turn(degrees: number): void;
  zoom(factor: number): void;
  /** Close up on the cut through one key or rail at (x, y), from the −y side. */
  lookAtSection(x: number, y: number, span: number): void;
}

interface CameraRigProps {
  /** Largest size of the face, mm: sets the starting distance. */
  size: number;
  ref?: Ref<CameraCommands>;
  /** Element that takes the arrow keys for panning (the focusable frame around the canvas). */
  keyTarget: HTMLElement | null;
}

const home = (size: number) => new Vector3(size * 0.85, -size * 1.35, size * 1.05);

/** Orbit (drag), pan (right-drag or arrow keys), zoom (wheel or pinch) and the toolbar's camera moves. */
export function CameraRig({ size, ref, keyTarget }: CameraRigProps) {
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

  useEffect(() => {
    camera.position.copy(home(size));
    controls.target.set(0, 0, 0);
    controls.update();
  }, [camera, controls, size]);

  useImperativeHandle(
    ref,
    () => ({
      reset() {
        camera.position.copy(home(size));
        controls.target.set(0, 0, 0);
        controls.update();
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
      lookAtSection(x, y, span) {
        camera.position.set(x + span * 0.6, y - span * 4.5, span * 0.9);
        controls.target.set(x, y, 0);
        controls.update();
      },
    }),
    [camera, controls, size],
  );
  return null;
}
