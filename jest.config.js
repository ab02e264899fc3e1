/** Jest configuration: ts-jest (isolatedModules in tsconfig: transpile per file; `npm run typecheck` checks types), one summary line at the end. */
module.exports = {
  testEnvironment: "node",
  roots: ["<rootDir>/test"],
  testMatch: ["**/*.test.ts"],
  transform: {
    "^.+\\.ts$": ["ts-jest", { tsconfig: "tsconfig.json" }],
  },
  moduleFileExtensions: ["ts", "js", "json"],
  setupFiles: ["<rootDir>/test/support/custom-functions-stub.ts"],
  reporters: ["default", "<rootDir>/test/support/summary-reporter.js"],
  testTimeout: 60000,
};
