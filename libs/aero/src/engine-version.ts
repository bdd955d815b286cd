/**
 * Version of the reduction engine, recorded with every result so that any figure can be reproduced.
 * Raise it whenever a change alters a reduced number (semantic versioning: major = changed numbers).
 */
export const ENGINE_VERSION = '0.1.0';
