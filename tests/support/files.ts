import { readdirSync } from "node:fs";
import { join, relative, sep } from "node:path";

/** Every file under a folder, as sorted forward-slash paths relative to it. */
export function filesUnder(root: string): string[] {
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const path = join(dir, entry.name);
      if (entry.isDirectory()) walk(path);
      else found.push(relative(root, path).split(sep).join("/"));
    }
  };
  walk(root);
  return found.sort();
}
