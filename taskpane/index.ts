/**
 * Entry of the pane bundle. The reference data render at once (they need no Office); the
 * outside-Excel notice and the Office theme follow when office.js has answered.
 */
import { mountPane } from "./app";
import { officeColorScheme, officeHost } from "./office";

function start(): void {
  const root = document.getElementById("app");
  if (!root) return;
  const pane = mountPane(root, document);
  void officeHost().then((host) => {
    pane.setHost(host);
    const scheme = officeColorScheme();
    if (scheme) document.documentElement.dataset["scheme"] = scheme;
  });
}

if (document.readyState === "loading") {
  document.addEventListener("DOMContentLoaded", start, { once: true });
} else {
  start();
}
