/**
 * Builds the add-in that runs inside Excel: the custom functions bundle (functions.js + the generated
 * functions.json metadata) and the task pane (taskpane.html + taskpane.js), which share one runtime.
 * HyperFormula (GPL) is used only by the command line in src/cli and never enters these bundles.
 *
 * The second configuration compiles the command line (src/cli/bin.ts, target node) to
 * dist/cli/protolyte.js: one file that starts in a fraction of the time tsx needs to compile the
 * sources. Its packages (HyperFormula, exceljs, papaparse, mathjs) stay in node_modules and are
 * required at run time; the add-in's `clean` keeps dist/cli.
 *
 * `npm run build` needs no certificates. `npm start` (scripts/start.mjs) passes the development
 * certificates through the PROTOLYTE_HTTPS_* environment variables for the HTTPS dev server.
 */
const path = require("path");
const webpack = require("webpack");
const fs = require("fs");
const HtmlWebpackPlugin = require("html-webpack-plugin");
const CopyWebpackPlugin = require("copy-webpack-plugin");
const CustomFunctionsMetadataPlugin = require("custom-functions-metadata-plugin");
const { HelpPagesPlugin } = require("./scripts/help-pages");

const PORT = 3000;

function httpsOptions() {
  const key = process.env.PROTOLYTE_HTTPS_KEY;
  const cert = process.env.PROTOLYTE_HTTPS_CERT;
  const ca = process.env.PROTOLYTE_HTTPS_CA;
  if (!key || !cert) return undefined;
  return {
    key: fs.readFileSync(key),
    cert: fs.readFileSync(cert),
    ca: ca && fs.existsSync(ca) ? fs.readFileSync(ca) : undefined,
  };
}

/**
 * Packages are required from node_modules at run time, except mathjs: bundled from its ES modules,
 * only the parts imported are kept (its full CommonJS entry takes longer to load than HyperFormula).
 */
const BUNDLED_PACKAGES = /^mathjs(\/|$)/;
function nodeModulesExternal({ request }, callback) {
  if (request && !request.startsWith(".") && !path.isAbsolute(request) && !BUNDLED_PACKAGES.test(request)) return callback(null, `commonjs ${request}`);
  return callback();
}

/** Marks an emitted file executable, so the package's `bin` runs it (`npx protolyte`). */
class ExecutablePlugin {
  constructor(file) {
    this.file = file;
  }
  apply(compiler) {
    compiler.hooks.afterEmit.tap("ExecutablePlugin", (compilation) => {
      const file = path.join(compilation.outputOptions.path, this.file);
      if (fs.existsSync(file)) fs.chmodSync(file, 0o755);
    });
  }
}

function cliConfig(production) {
  return {
    name: "cli",
    target: "node20",
    devtool: false,
    entry: { protolyte: "./src/cli/bin.ts", "table-worker": "./src/cli/table-worker.ts" },
    output: { path: path.resolve(__dirname, "dist", "cli"), filename: "[name].js", clean: true },
    resolve: { extensions: [".ts", ".js", ".json"] },
    externals: [nodeModulesExternal],
    externalsPresets: { node: true },
    module: {
      rules: [
        {
          test: /\.ts$/,
          exclude: /node_modules/,
          use: { loader: "ts-loader", options: { transpileOnly: true, compilerOptions: { module: "es2020", sourceMap: false } } },
        },
      ],
    },
    optimization: { minimize: false },
    performance: { hints: false },
    plugins: [new webpack.BannerPlugin({ banner: "#!/usr/bin/env node", raw: true, entryOnly: true }), new ExecutablePlugin("protolyte.js")],
    node: { __dirname: false, __filename: false },
    mode: production ? "production" : "development",
  };
}

module.exports = (_env, argv) => [addinConfig(argv), cliConfig(argv.mode === "production")];

function addinConfig(argv) {
  const production = argv.mode === "production";
  const https = httpsOptions();
  return {
    name: "addin",
    devtool: production ? false : "source-map",
    // The task pane depends on the functions bundle: both run in one shared runtime, and dependOn
    // makes them share module instances (one active constants library, one copy of the engine).
    entry: {
      functions: "./src/functions/functions.ts",
      taskpane: { import: "./src/taskpane/taskpane.ts", dependOn: "functions" },
    },
    output: {
      path: path.resolve(__dirname, "dist"),
      filename: "[name].js",
      clean: { keep: /^cli[\\/]/ },
    },
    resolve: { extensions: [".ts", ".js", ".json"] },
    module: {
      rules: [
        {
          test: /\.ts$/,
          exclude: /node_modules/,
          use: { loader: "ts-loader", options: { transpileOnly: true, compilerOptions: { module: "es2020", sourceMap: !production } } },
        },
      ],
    },
    performance: { hints: false },
    plugins: [
      new CustomFunctionsMetadataPlugin({ output: "functions.json", input: "./src/functions/functions.ts" }),
      new HtmlWebpackPlugin({
        filename: "taskpane.html",
        template: "./src/taskpane/taskpane.html",
        chunks: ["functions", "taskpane"],
        inject: "body",
        scriptLoading: "blocking",
      }),
      new HelpPagesPlugin(),
      new CopyWebpackPlugin({
        patterns: [
          { from: "assets", to: "assets" },
          { from: "manifest.xml", to: "manifest.xml" },
        ],
      }),
    ],
    devServer: {
      port: PORT,
      host: "localhost",
      headers: { "Access-Control-Allow-Origin": "*" },
      static: { directory: path.resolve(__dirname, "dist") },
      server: https ? { type: "https", options: https } : "http",
      client: { overlay: false },
      hot: false,
      liveReload: false,
    },
  };
}
