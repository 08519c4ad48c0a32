/**
 * `npm run stop`: stops the background server that `npm start` launched, by the pid it recorded
 * (node_modules/.cache/phasecell/server.pid). Only that process is signalled, and only after
 * checking it still runs addin/serve.mjs; a stale pid file is removed. A server started in the
 * foreground with `npm run dev-server` stops with Ctrl+C instead.
 */
import { setTimeout as sleep } from "node:timers/promises";
import { isOurServer, readPid, removePidFile } from "./server-state.mjs";

const pid = readPid();
if (pid === null) {
  console.log("no Phasecell server is recorded as running (nothing to stop).");
  process.exit(0);
}
if (!isOurServer(pid)) {
  removePidFile();
  console.log(`the recorded server (pid ${pid}) is no longer running; removed the stale pid file.`);
  process.exit(0);
}

process.kill(pid, "SIGTERM");
for (let waited = 0; waited < 10_000; waited += 200) {
  if (!isOurServer(pid)) {
    removePidFile();
    console.log(`stopped the Phasecell server (pid ${pid}).`);
    process.exit(0);
  }
  await sleep(200);
}
console.log(`the server (pid ${pid}) did not stop within 10 s of SIGTERM; sending SIGKILL.`);
process.kill(pid, "SIGKILL");
removePidFile();
