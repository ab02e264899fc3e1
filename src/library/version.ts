/**
 * The software version written into exports and pins ("Protolyte 0.1.0"). It must equal
 * package.json's version (test/library/pin.test.ts checks it); it is written here rather than
 * imported so that the bundles do not carry the whole package.json.
 */
export const SOFTWARE_VERSION = "0.1.0";
export const SOFTWARE_NAME = `Protolyte ${SOFTWARE_VERSION}`;
