/**
 * The robustness property itself can fail: the checker flags every kind of bad outcome the fuzz
 * suites look for (so a passing campaign means something).
 */
import { outcomeOf, outcomeProblem, valueProblem } from "./outcome";

const cfError = (code: string, message: string) => (): never => {
  throw new CustomFunctions.Error(code as CustomFunctions.ErrorCode, message);
};

test.each<[string, () => unknown, "scalar" | "matrix"]>([
  ["NaN", () => NaN, "scalar"],
  ["Infinity", () => Infinity, "scalar"],
  ["an array from a scalar function", () => [[1]], "scalar"],
  ["a NaN inside a table", () => [["a", "b"], [1, NaN]], "matrix"],
  ["a ragged table", () => [["a", "b"], [1]], "matrix"],
  ["an undefined cell", () => [["a", undefined]], "matrix"],
  ["an empty table", () => [], "matrix"],
  ["a TypeError escaping", () => (undefined as unknown as { x: number }).x, "scalar"],
  ["a #NUM! error", cfError("#NUM!", "bad"), "scalar"],
  ["a #VALUE! without a message", cfError("#VALUE!", " "), "scalar"],
  ["a two-line message", cfError("#N/A", "one\ntwo"), "scalar"],
  ["a 251-character message", cfError("#VALUE!", "x".repeat(251)), "scalar"],
  ["an internal error", cfError("#VALUE!", "internal error: Cannot read properties of undefined"), "scalar"],
])("flags %s", (_what, fn, result) => {
  expect(outcomeProblem(outcomeOf(fn, []), result)).not.toBeNull();
});

test.each<[string, () => unknown, "scalar" | "matrix"]>([
  ["a finite number", () => 7.0, "scalar"],
  ["text", () => "PL-1.0.0-abc", "scalar"],
  ["a table of text and numbers", () => [["species", "mol/L"], ["H+", 1e-7]], "matrix"],
  ["#N/A with a message", cfError("#N/A", "species 'X' is not in this mixture"), "scalar"],
])("accepts %s", (_what, fn, result) => {
  expect(outcomeProblem(outcomeOf(fn, []), result)).toBeNull();
});

test("valueProblem names the defect", () => {
  expect(valueProblem([[1, Infinity]], "matrix")).toBe("non-finite number Infinity");
});
