/**
 * Jest has no Office runtime. This stub provides the small part of the `CustomFunctions` global
 * that the functions use: the Error class, the ErrorCode enumeration and `associate`.
 */
class StubCustomFunctionsError extends Error {
  readonly code: string;
  constructor(code: string, message?: string) {
    super(message ?? "");
    this.code = code;
    this.name = "CustomFunctions.Error";
  }
}

const associations = new Map<string, unknown>();

(globalThis as Record<string, unknown>).CustomFunctions = {
  Error: StubCustomFunctionsError,
  ErrorCode: {
    invalidValue: "#VALUE!",
    notAvailable: "#N/A",
    divisionByZero: "#DIV/0!",
    invalidNumber: "#NUM!",
    nullReference: "#NULL!",
    invalidName: "#NAME?",
    invalidReference: "#REF!",
  },
  associate(id: string, fn: unknown) {
    associations.set(id, fn);
  },
  __associations: associations,
};
