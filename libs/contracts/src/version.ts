/** The product version, one place for server, web and CLI. */
export const HEXLOOM_VERSION = '0.1.0';
