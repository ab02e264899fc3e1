/** AQ.CONSTANTS_ID: fingerprint and version of the constants in effect, for release sheets. */
import { libraryKey } from "../substances";

export function constantsId(): string {
  return libraryKey();
}
