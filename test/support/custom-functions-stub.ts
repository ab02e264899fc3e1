/** Jest has no Office runtime: install the same CustomFunctions stand-in the command line uses. */
import "../../src/functions/runtime-shim";
