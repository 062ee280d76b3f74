// Copies the variable-font woff2 subsets Gybe uses from @fontsource-variable into app/fonts,
// together with each package's OFL-1.1 LICENSE. The copies are committed so that the build
// never depends on a devDependency or the network. Run: node scripts/copy-fonts.mjs
import { copyFileSync, mkdirSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const out = join(root, "app", "fonts");
mkdirSync(out, { recursive: true });

const fonts = [
  { pkg: "inter", files: ["inter-latin-wght-normal.woff2", "inter-greek-wght-normal.woff2"] },
  {
    pkg: "jetbrains-mono",
    files: ["jetbrains-mono-latin-wght-normal.woff2", "jetbrains-mono-greek-wght-normal.woff2"],
  },
];

for (const { pkg, files } of fonts) {
  const dir = join(root, "node_modules", "@fontsource-variable", pkg);
  for (const f of files) {
    copyFileSync(join(dir, "files", f), join(out, f));
    console.log(`copied ${f}`);
  }
  copyFileSync(join(dir, "LICENSE"), join(out, `${pkg}-LICENSE.txt`));
  console.log(`copied ${pkg} LICENSE`);
}
