/** Version of the calculation core; stored with every evaluated revision (semver). */
export const CORE_VERSION = '1.0.0';
