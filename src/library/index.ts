/**
 * Public API of the constants library. See README.md in this folder for the file format and the
 * layering.
 */
export * from "./types";
export { BUILTIN_LIBRARY, BUILTIN_VERSION } from "./builtin";
export { createLibrary } from "./layers";
export type { Library, LibraryLayers, LayerDocs, LayerIssue, MergedEntry, ResolveResult } from "./layers";
export { normalizeName } from "./normalize";
export type { Suggestion } from "./suggest";
export { parseFormula, molarMassOf } from "./formula";
export { validateLibraryDoc } from "./validate";
export type { ValidationResult, ValidationCode } from "./validate";
export { formatIssue } from "./validate/paths";
export { fieldWords, issueLines, issueWords, once } from "./validate/words";
export { computeFingerprint } from "./fingerprint";
export { getActiveLibrary, referenceContext, setLayer, reportLayerProblem, getLayerProblems, onLibraryChange, resetActiveLibrary } from "./active";
export type { UserLayer, LayerProblem, SetLayerResult } from "./active";
export { parseLibraryText, exportLibraryText, importIntoLayer, mergeLibraryDocs, flattenLibrary, MAX_LIBRARY_BYTES } from "./io";
export type { ParseResult, ImportResult, ImportCode } from "./io";
export { pKbToPKa, PKW_25C } from "./pkb";
export type { PkbResult } from "./pkb";
export * from "./storage";
export { describeProvenance, formatSource, reviseValue } from "./provenance";
export { takenBy, nameClaims } from "./claims";
export type { NameClaim } from "./claims";
export { nameCharacterProblem } from "./validate/name-chars";
export { duplicateKey } from "./json-keys";
export { diffRecords, makeChange, withChange } from "./change-record";
export type { ChangeInput, Diff } from "./change-record";
export { stampExport, exportFileName, withoutStamp, describeStamp } from "./export-stamp";
export { pinNames, pinDrift, updatePin, dependenciesOf, putEntry, recordOf } from "./pin";
export type { PinPlan, DriftItem } from "./pin";
export { SOFTWARE_VERSION, SOFTWARE_NAME } from "./version";
export { convertPKa, measuredConditionsText, AT_25C_WITHIN } from "./conditions";
export type { PKaConversion } from "./conditions";
