/** Conecast's version, written into every output; a test keeps it equal to package.json's. */
export const CONECAST_VERSION = '0.1.0';
