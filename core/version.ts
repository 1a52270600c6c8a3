/** Program version; a test keeps it equal to package.json's. */
export const BRINEFIELD_VERSION = "0.1.0";
