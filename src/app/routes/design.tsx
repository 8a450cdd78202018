import { DesignScreen } from '../../features/design/components/design-screen';

/** /design: the joint designer. Loaded lazily, so three.js and the geometry code load only here. */
export function DesignRoute() {
  return <DesignScreen />;
}
