/** The software version written into exports and pins ("Protolyte 0.1.0"), from package.json. */
import pkg from "../../package.json";

export const SOFTWARE_VERSION: string = pkg.version;
export const SOFTWARE_NAME = `Protolyte ${SOFTWARE_VERSION}`;
