// Bundles the add-in into dist/:
//   functions.js + functions.json (metadata generated from the JSDoc in src/functions/functions.ts) + functions.html
//   taskpane.js + taskpane.html  (the shared-runtime page: it also loads functions.js and commands.js)
//   commands.js + commands.html
//   assets/ (icons named by manifest.xml)
//   cli/redox-cells.cjs (+ cli/*.cjs chunks): the command line, prebuilt for Node so that bin/redox-cells.mjs starts
//                                without a compiler; --help and --version load only the first, small file
//
// Office.js URL in the HTML pages (build-time choice, see DEVELOPERS.md):
//   default                      https://appsforoffice.microsoft.com/lib/1/hosted/office.js (the official CDN)
//   REDOX_OFFICE_JS=local        /office-js/office.js — the dev server serves node_modules/@microsoft/office-js/dist
//                                there; use it offline or in browser tests run against the dev server
//   REDOX_OFFICE_JS=<any URL>    that URL as is
// Browser tests that load dist/ from a server of their own can also keep the CDN URL and answer the request for it
// from node_modules/@microsoft/office-js/dist/office.js (e.g. playwright's page.route).

const fs = require("fs");
const os = require("os");
const path = require("path");
const zlib = require("zlib");
const HtmlWebpackPlugin = require("html-webpack-plugin");
const CopyWebpackPlugin = require("copy-webpack-plugin");
const CustomFunctionsMetadataPlugin = require("custom-functions-metadata-plugin");
const { ErrorCellsMetadataPlugin } = require("./scripts/error-cells-metadata-plugin");

const OFFICE_JS_CDN = "https://appsforoffice.microsoft.com/lib/1/hosted/office.js";
const OFFICE_JS_LOCAL = "/office-js/office.js";
const DEV_PORT = 3000;
const CERT_DIR = path.join(os.homedir(), ".office-addin-dev-certs");

/** The Office.js URL written into the HTML pages. */
function officeJsUrl() {
  const choice = (process.env.REDOX_OFFICE_JS || "").trim();
  if (choice === "" || choice === "cdn") return OFFICE_JS_CDN;
  if (choice === "local") return OFFICE_JS_LOCAL;
  return choice;
}

/**
 * HTTPS options for the dev server, read straight from the files office-addin-dev-certs writes. The package's own
 * getHttpsServerOptions() rejects when the CA could not be trusted (headless Linux without sudo), although the
 * three files are there and usable; `npm start` explains what an untrusted CA means.
 */
function devServerHttps() {
  const files = { key: "localhost.key", cert: "localhost.crt", ca: "ca.crt" };
  const options = {};
  for (const [name, file] of Object.entries(files)) {
    const full = path.join(CERT_DIR, file);
    if (!fs.existsSync(full)) {
      throw new Error(
        `Missing ${full}. Run \`npm start\` (it creates the development certificates) ` +
          "or `npx office-addin-dev-certs install` first.",
      );
    }
    options[name] = fs.readFileSync(full);
  }
  return options;
}

/**
 * cautions.html, the page the pane's caution line links to: README's "Cautions" section, so the two never differ.
 * Paragraphs become <p>; `code` and **bold** marks are dropped to plain text.
 */
function cautionsPage() {
  const readme = fs.readFileSync(path.resolve(__dirname, "README.md"), "utf8");
  const section = (readme.split(/^## Cautions$/m)[1] || "").split(/^## /m)[0].trim();
  const escape = (text) => text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;");
  const paragraphs = section
    .split(/\n\s*\n/)
    .map((p) => `<p>${escape(p.replace(/\s+/g, " ").replace(/\*\*|`/g, ""))}</p>`)
    .join("\n");
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Redox Cells: cautions</title>
<style>body{font:15px/1.5 system-ui,sans-serif;max-width:40em;margin:2em auto;padding:0 1em;color:#1d2327}</style>
</head><body><h1 id="cautions">Cautions</h1>
${paragraphs}
</body></html>`;
}

/** Prints every emitted asset with its size and the gzipped size of functions.js (production builds). */
class ReportSizesPlugin {
  apply(compiler) {
    compiler.hooks.afterEmit.tap("ReportSizesPlugin", (compilation) => {
      // After emit the in-memory sources only know their size; the gzip figure reads the file written to disk.
      const outDir = compilation.outputOptions.path;
      const rows = Object.entries(compilation.assets).map(([name, source]) => [name, source.size()]);
      rows.sort((a, b) => a[0].localeCompare(b[0]));
      const lines = rows.map(([name, size]) => `  ${name.padEnd(28)} ${(size / 1024).toFixed(1).padStart(8)} KB`);
      const functionsPath = path.join(outDir, "functions.js");
      let gzipLine = "  functions.js not emitted";
      if (fs.existsSync(functionsPath)) {
        const gz = zlib.gzipSync(fs.readFileSync(functionsPath), { level: 9 }).length;
        gzipLine = `  functions.js gzipped: ${(gz / 1024).toFixed(1)} KB (${gz} bytes; budget 150 KB)`;
      }
      console.log(["", "Redox Cells build output:", ...lines, gzipLine, ""].join("\n"));
    });
  }
}

/**
 * The command line for Node: one CommonJS file with its dependencies (zod, mathjs, the data files) and a
 * lazily loaded chunk for the pipeline, so that --version and --help answer without loading the chemistry. Not
 * minified: stack traces stay readable and the build stays quick.
 */
function cliConfig(mode) {
  const pkg = JSON.parse(fs.readFileSync(path.resolve(__dirname, "package.json"), "utf8"));
  const { DefinePlugin } = require("webpack");
  return {
    name: "cli",
    mode,
    devtool: false,
    target: "node20",
    entry: { "redox-cells": "./src/cli/main.ts" },
    output: {
      path: path.resolve(__dirname, "dist/cli"),
      filename: "[name].cjs",
      chunkFilename: "[name].cjs",
      library: { type: "commonjs2" },
      clean: true,
    },
    resolve: { extensions: [".ts", ".js"], extensionAlias: { ".js": [".ts", ".js"] } },
    module: {
      rules: [
        { test: /\.ts$/, exclude: /node_modules/, use: { loader: "ts-loader", options: { transpileOnly: true } } },
      ],
    },
    optimization: { minimize: false },
    performance: { hints: false },
    plugins: [new DefinePlugin({ __REDOX_CELLS_VERSION__: JSON.stringify(pkg.version) })],
  };
}

// the dev server serves the add-in only
module.exports = (env = {}, argv = {}) =>
  env.WEBPACK_SERVE ? addinConfig(env, argv) : [addinConfig(env, argv), cliConfig(argv.mode || "production")];

function addinConfig(env, argv) {
  const mode = argv.mode || "production";
  const serving = Boolean(env.WEBPACK_SERVE);
  const officeJs = officeJsUrl();

  const page = (name, chunks) =>
    new HtmlWebpackPlugin({
      filename: `${name}.html`,
      template: `./src/${name}/${name}.html`,
      chunks,
      chunksSortMode: "manual",
      officeJs,
      inject: "body",
      scriptLoading: "blocking",
    });

  return {
    mode,
    devtool: mode === "production" ? "source-map" : "eval-source-map",
    target: ["web", "es2020"],
    entry: {
      functions: "./src/functions/functions.ts",
      taskpane: "./src/taskpane/taskpane.ts",
      commands: "./src/commands/commands.ts",
    },
    output: {
      path: path.resolve(__dirname, "dist"),
      filename: "[name].js",
      // The functions bundle also runs where only CustomFunctions exists (the spreadsheet's custom-function runtime,
      // and the Node vm harness in tests/bundle): no window, self or document.
      globalObject: "globalThis",
      publicPath: "",
      // dist/cli is the command line's, built by cliConfig
      clean: { keep: /^cli[\\/]/ },
    },
    resolve: {
      extensions: [".ts", ".js"],
      extensionAlias: { ".js": [".ts", ".js"] },
    },
    module: {
      rules: [
        {
          test: /\.ts$/,
          exclude: /node_modules/,
          use: { loader: "ts-loader", options: { transpileOnly: true } },
        },
      ],
    },
    performance: { hints: false },
    plugins: [
      new CustomFunctionsMetadataPlugin({
        input: "./src/functions/functions.ts",
        output: "functions.json",
      }),
      new ErrorCellsMetadataPlugin("functions.json"),
      // The shared runtime loads taskpane.html once and keeps it: that page carries all three bundles.
      page("taskpane", ["functions", "commands", "taskpane"]),
      page("functions", ["functions"]),
      page("commands", ["commands"]),
      new HtmlWebpackPlugin({ filename: "cautions.html", templateContent: cautionsPage(), inject: false }),
      new CopyWebpackPlugin({
        patterns: [
          { from: "assets/*.png", context: path.resolve(__dirname), to: "assets/[name][ext]" },
          { from: "src/taskpane/taskpane.css", context: path.resolve(__dirname), to: "taskpane.css" },
        ],
      }),
      ...(mode === "production" ? [new ReportSizesPlugin()] : []),
    ],
    devServer: serving
      ? {
          host: "localhost",
          port: DEV_PORT,
          server: { type: "https", options: devServerHttps() },
          headers: { "Access-Control-Allow-Origin": "*" },
          static: [
            {
              directory: path.resolve(__dirname, "node_modules/@microsoft/office-js/dist"),
              publicPath: "/office-js",
              watch: false,
            },
          ],
          client: { overlay: false },
        }
      : undefined,
  };
}
