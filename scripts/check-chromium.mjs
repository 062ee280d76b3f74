// Stops the end-to-end step at once, with instructions, when Debian's Chromium is missing.
import fs from "node:fs";

const path = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
if (!fs.existsSync(path)) {
  console.error(
    `\nEnd-to-end tests need Debian's Chromium at ${path}, which is missing.\n` +
      "Install it with:  sudo apt-get update && sudo apt-get install -y chromium\n" +
      "(or set CHROMIUM_PATH to another Chromium binary). Playwright never downloads a browser here.\n",
  );
  process.exit(1);
}
