/**
 * The HTTPS server behind `npm start`: webpack-dev-server at https://localhost:3000 with the
 * devServer settings of addin/webpack.config.js. `npm start` runs it in the background with
 * `--mode production`, so it serves the release build it has just tested (written to dist/ and
 * rebuilt when a source changes). `npm run dev-server` is the same server in the foreground
 * with the development build (namespace PHASEDEV) and live reload.
 *
 * Stops cleanly on SIGTERM/SIGINT (`npm run stop`) and then removes its pid file.
 */
import { createRequire } from "node:module";
import { removePidFile } from "./server-state.mjs";

const require = createRequire(import.meta.url);
const webpack = require("webpack");
const WebpackDevServer = require("webpack-dev-server");
const configure = require("./webpack.config.js");

const modeFlag = process.argv.indexOf("--mode");
const mode = modeFlag >= 0 && process.argv[modeFlag + 1] === "development" ? "development" : "production";

const config = await configure({ WEBPACK_SERVE: true }, { mode });
const compiler = webpack(config);
const server = new WebpackDevServer(config.devServer, compiler);

let stopping = false;
async function shutdown(signal) {
  if (stopping) return;
  stopping = true;
  console.log(`${new Date().toISOString()} ${signal}: stopping the server`);
  try {
    await server.stop();
  } finally {
    removePidFile(process.pid);
    process.exit(0);
  }
}
process.on("SIGTERM", () => void shutdown("SIGTERM"));
process.on("SIGINT", () => void shutdown("SIGINT"));

await server.start();
console.log(`${new Date().toISOString()} serving the ${mode} build at https://localhost:${config.devServer.port}/ (pid ${process.pid})`);
