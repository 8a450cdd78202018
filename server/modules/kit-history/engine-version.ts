import packageJson from '../../../package.json';

/** The Seamwright version that builds kits now, recorded with each download to say which one built it. */
export const ENGINE_VERSION: string = packageJson.version;
