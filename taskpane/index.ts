/**
 * Entry of the pane bundle. The reference data and the pane's own path render at once (they need
 * no Office); the outside-Excel notice, the Office theme and, in Excel, the selected PATH result
 * follow when office.js has answered.
 */
import { mountPane } from "./app";
import { officeColorScheme, officeHost } from "./office";
import { followSelection, followStatePoints } from "./office-selection";

function start(): void {
  const root = document.getElementById("app");
  if (!root) return;
  const pane = mountPane(root, document);
  void officeHost().then((host) => {
    pane.setHost(host);
    const scheme = officeColorScheme();
    if (scheme) document.documentElement.dataset["scheme"] = scheme;
    if (host === "Excel") {
      followSelection((view) => pane.showSelection(view));
      followStatePoints(() => pane.displayUnitsText(), (points) => pane.showStatePoints(points));
    }
  });
}

if (document.readyState === "loading") {
  document.addEventListener("DOMContentLoaded", start, { once: true });
} else {
  start();
}
