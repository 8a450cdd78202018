import { useFrame } from '@react-three/fiber';
import { useEffect, useMemo, useRef, type RefObject } from 'react';
import { Vector3 } from 'three';

interface GapPinProps {
  /** The gap's point on the section plane, mm. */
  x: number;
  y: number;
  z: number;
  /** The label element over the canvas (positioned at its top-left corner); its origin is moved onto the point. */
  label: RefObject<HTMLElement | null>;
}

/**
 * Keeps the clearance label on the gap as the camera moves: each drawn frame projects the point and moves the
 * element with a transform (no React state; one reused vector; the style is only written when it changes). The
 * label hides when the point leaves the view.
 */
export function GapPin({ x, y, z, label }: GapPinProps) {
  const point = useMemo(() => new Vector3(), []);
  const shown = useRef('');
  useEffect(
    () => () => {
      shown.current = '';
      if (label.current) label.current.style.visibility = 'hidden';
    },
    [label],
  );
  useFrame(({ camera, size }) => {
    const el = label.current;
    if (!el) return;
    camera.updateMatrixWorld();
    point.set(x, y, z).project(camera);
    const inView = point.z < 1 && Math.abs(point.x) <= 1 && Math.abs(point.y) <= 1;
    const left = Math.round(((point.x + 1) / 2) * size.width);
    const top = Math.round(((1 - point.y) / 2) * size.height);
    const transform = inView ? `translate(${left}px, ${top}px)` : 'hidden';
    if (transform === shown.current) return;
    shown.current = transform;
    el.style.visibility = inView ? 'visible' : 'hidden';
    if (inView) el.style.transform = transform;
  });
  return null;
}
