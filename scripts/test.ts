// npm test: unit and integration tests, then the server and browser tests against a production build.
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";

import { buildIsFresh } from "./lib/build-state";

const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
const bin = (name: string) => path.join("node_modules", ".bin", name);
// The AWS SDK's notice that its 2027 releases need Node 22 is printed once per test process; the
// version is pinned (stack notes), so the test log leaves it out.
const TEST_ENV = { NEXT_TELEMETRY_DISABLED: "1", AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: "true" };
const run = (cmd: string, args: string[]) => spawnSync(cmd, args, { stdio: "inherit", env: { ...process.env, ...TEST_ENV } }).status ?? 1;

const failures: string[] = [];
if (run(bin("vitest"), ["run"]) !== 0) failures.push("unit and integration tests");

const haveBrowser = fs.existsSync(CHROMIUM);
if (!haveBrowser && process.env.REQUIRE_BROWSER === "1") {
  console.error(`\nChromium was not found at ${CHROMIUM}, and REQUIRE_BROWSER=1 makes the browser tests required (apt-get install -y chromium).`);
  failures.push("browser tests (no Chromium)");
} else {
  if (!haveBrowser) console.log(`\nChromium not found at ${CHROMIUM}: skipping the browser tests (apt-get install -y chromium to run them).`);
  if (!buildIsFresh()) {
    console.log("\nBuilding the app for the server tests (next build)...");
    if (run(bin("next"), ["build"]) !== 0) failures.push("next build");
  }
  if (!failures.includes("next build")) {
    const args = ["run", "--config", "vitest.server.config.mts", ...(haveBrowser ? [] : ["--exclude", "tests/browser/**"])];
    if (run(bin("vitest"), args) !== 0) failures.push(haveBrowser ? "server and browser tests" : "server tests");
  }
}

if (failures.length) {
  console.error(`\nFailed: ${failures.join(", ")}`);
  process.exit(1);
}
console.log("\nAll test groups passed.");
