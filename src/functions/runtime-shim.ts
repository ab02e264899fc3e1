/**
 * Outside Excel (the command line, jest) there is no `CustomFunctions` global. This installs a
 * small, faithful stand-in: the Error class with its code, the ErrorCode values as Excel displays
 * them, and `associate` (recorded, for tests). Inside Excel the real global exists and this does nothing.
 */
class ShimCustomFunctionsError extends Error {
  readonly code: string;
  constructor(code: string, message?: string) {
    super(message ?? "");
    this.code = code;
    this.name = "CustomFunctions.Error";
  }
}

export const shimAssociations = new Map<string, unknown>();

export function installCustomFunctionsShim(): void {
  const g = globalThis as Record<string, unknown>;
  if (g.CustomFunctions !== undefined) return;
  g.CustomFunctions = {
    Error: ShimCustomFunctionsError,
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
      shimAssociations.set(id, fn);
    },
  };
}

installCustomFunctionsShim();
