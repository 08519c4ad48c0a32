/**
 * Build of the Phasecell add-in: one shared page (taskpane.html) that hosts the side pane and the
 * custom functions, the functions bundle and its generated metadata, the manifest and the icons.
 *
 *   npm run build       production bundle into dist/ (release manifest; origin from PHASECELL_ORIGIN)
 *   npm run build:dev   development bundle into dist/ (dev manifest: namespace PHASEDEV, own Id)
 *   npm run dev-server  development bundle served from memory at https://localhost:3000, rebuilt on change
 *
 * Decisions:
 * - functions.json is generated from the JSDoc of functions/index.ts by the metadata plugin, which
 *   also appends the CustomFunctions.associate calls; nothing is edited by hand. It is not
 *   post-processed: `allowErrorForDataTypeAny` is left off, so Excel itself propagates an error
 *   cell given as input (as its own functions do) instead of handing an error object to code that
 *   expects numbers or text.
 * - Both bundles are plain deferred <script> tags in the page head (functions first, so the
 *   associations exist before any pane code runs); no module scripts, no lazy chunks, no shared
 *   runtime chunk: each bundle stands alone.
 * - Content-Security-Policy friendly: no eval-based source maps in any mode (separate .map files in
 *   development, none in production), no runtime code generation.
 * - ts-loader only transpiles (`transpileOnly`); types are checked by `npm run typecheck`. Output
 *   syntax is ES2020 so older Office web views (Safari on macOS) run it.
 */
"use strict";
/* eslint-disable @typescript-eslint/no-require-imports -- a CommonJS file: package.json has no "type": "module", and webpack-cli loads .js configs with require() */

const path = require("node:path");
const { Buffer } = require("node:buffer");
const HtmlWebpackPlugin = require("html-webpack-plugin");
const CopyWebpackPlugin = require("copy-webpack-plugin");
const CustomFunctionsMetadataPlugin = require("custom-functions-metadata-plugin");
const { flavourManifest, DEV_PORT } = require("./manifest-flavour.cjs");

const root = path.resolve(__dirname, "..");
const dist = path.join(root, "dist");
const functionsSource = path.join(root, "functions", "index.ts");

/**
 * @param {Record<string, unknown>} env webpack-cli's env (WEBPACK_SERVE is set by `webpack serve`)
 * @param {{ mode?: string }} argv
 */
module.exports = async (env = {}, argv = {}) => {
  const mode = argv.mode === "development" ? "development" : "production";
  const development = mode === "development";
  const serving = Boolean(env.WEBPACK_SERVE);
  const flavour = development ? "dev" : "release";
  const origin = development ? undefined : process.env.PHASECELL_ORIGIN;

  /** @type {import("webpack").Configuration} */
  const config = {
    mode,
    context: root,
    target: ["web", "es2020"],
    entry: {
      functions: "./functions/index.ts",
      taskpane: "./taskpane/index.ts",
    },
    output: {
      path: dist,
      // Fixed names: the manifest points at functions.js, and the page is the manifest's Page.
      filename: "[name].js",
      clean: true,
    },
    resolve: { extensions: [".ts", ".js"] },
    devtool: development ? "source-map" : false,
    module: {
      rules: [
        {
          test: /\.ts$/,
          exclude: /node_modules/,
          use: {
            loader: "ts-loader",
            options: {
              configFile: path.join(root, "tsconfig.json"),
              transpileOnly: true,
              compilerOptions: {
                noEmit: false,
                target: "ES2020",
                useDefineForClassFields: true,
                sourceMap: development,
              },
            },
          },
        },
      ],
    },
    optimization: {
      splitChunks: false,
      runtimeChunk: false,
    },
    performance: {
      // One page, loaded once per opened workbook; warn only when a bundle grows past 500 KiB.
      maxAssetSize: 512 * 1024,
      maxEntrypointSize: 1024 * 1024,
    },
    plugins: [
      new CustomFunctionsMetadataPlugin({ input: functionsSource, output: "functions.json" }),
      new HtmlWebpackPlugin({
        filename: "taskpane.html",
        template: path.join(root, "addin", "taskpane.html"),
        chunks: ["functions", "taskpane"],
        chunksSortMode: "manual",
        inject: "head",
        scriptLoading: "defer",
      }),
      new CopyWebpackPlugin({
        patterns: [
          { from: path.join(root, "addin", "assets", "*.png"), to: "assets/[name][ext]" },
          // The page links its stylesheet as a plain file (style-src 'self'; no CSS in JS).
          { from: path.join(root, "taskpane", "*.css"), to: "[name][ext]", noErrorOnMissing: true },
          {
            from: path.join(root, "manifest.xml"),
            to: "manifest.xml",
            transform: {
              transformer: (content) =>
                Buffer.from(flavourManifest(content.toString("utf8"), origin === undefined ? { flavour } : { flavour, origin })),
              cache: false,
            },
          },
        ],
      }),
    ],
  };

  if (serving) {
    const { loadDevCertificates } = await import("./dev-certs.mjs");
    const certificates = await loadDevCertificates({ log: (line) => console.log(line) });
    for (const note of certificates.notes) console.log(`note: ${note}`);
    config.devServer = {
      port: DEV_PORT,
      host: "localhost",
      server: { type: "https", options: { key: certificates.key, cert: certificates.cert, ca: certificates.ca } },
      headers: {
        // Excel on the web fetches functions.json and the icons from its own origin.
        "Access-Control-Allow-Origin": "*",
        "Cache-Control": "no-store",
      },
      static: false,
      hot: false,
      // The release build served by `npm start` is exactly what was tested: no client injected.
      liveReload: development,
      client: development ? { overlay: false, logging: "warn" } : false,
      devMiddleware: { writeToDisk: !development },
    };
  }

  return config;
};
