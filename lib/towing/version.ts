/** Version of the calculation core. Bump the minor for a new check or field, the major when a saved result would read differently. */
export const CORE_VERSION = "2.4.1";
