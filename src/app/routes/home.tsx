import { HomeHero } from '../../features/home/components/home-hero';

/** The landing page: what Seamwright does, a picture of it, and "start designing". */
export function HomeRoute() {
  return <HomeHero />;
}
