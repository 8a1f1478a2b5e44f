import { existsSync, readdirSync, readFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { describe, expect, it } from "vitest";

// DEVELOPERS.md is the map a newcomer follows: its architecture tree names every folder of app/, lib/ and
// components/, every path it names exists, and its links and the docs' links stay inside the repository.
const ROOT = process.cwd();
const GUIDE = readFileSync(join(ROOT, "DEVELOPERS.md"), "utf8");

/** The code block under "## Architecture". */
function architectureTree(): string {
  const section = GUIDE.split(/^## /m).find((part) => part.startsWith("Architecture\n"));
  const block = section?.match(/```\n([\s\S]*?)```/);
  if (!block) throw new Error('DEVELOPERS.md has no "## Architecture" section with a tree in a code block');
  return block[1]!;
}

/** The folders directly inside one top-level folder. */
function topFolders(root: string): string[] {
  return readdirSync(join(ROOT, root), { withFileTypes: true })
    .filter((entry) => entry.isDirectory())
    .map((entry) => entry.name);
}

/** Relative link targets of a markdown text, without their anchors. */
function relativeLinks(text: string): string[] {
  return [...text.matchAll(/\]\(([^)\s]+)\)/g)]
    .map((m) => m[1]!)
    .filter((target) => !/^[a-z]+:/i.test(target) && !target.startsWith("#"))
    .map((target) => target.split("#")[0]!);
}

/** A clone elsewhere has nothing outside the repository: no absolute paths of one machine. */
const OUTSIDE = /(^|[\s(`])\/(work|home|tmp|Users)\//m;

const DOCS = readdirSync(join(ROOT, "docs")).filter((name) => name.endsWith(".md"));

describe("the contributor guide", () => {
  it("names every top-level folder of app/, lib/ and components/ in its architecture tree", () => {
    const tree = architectureTree();
    const missing: string[] = [];
    for (const root of ["app", "lib", "components"])
      for (const folder of topFolders(root)) if (!tree.includes(`${root}/${folder}/`)) missing.push(`${root}/${folder}/`);
    expect(missing).toEqual([]);
  });

  it("names no path in its tree that does not exist", () => {
    const paths = [...architectureTree().matchAll(/(?:^|\s)((?:app|lib|components|db|scripts|tests)\/[^\s,]*)/g)].map((m) => m[1]!);
    expect(paths.length).toBeGreaterThan(20);
    expect(paths.filter((path) => !existsSync(join(ROOT, path)))).toEqual([]);
  });

  it("links only to files that are in the repository, and so do the docs", () => {
    const broken: string[] = [];
    for (const target of relativeLinks(GUIDE)) if (!existsSync(join(ROOT, target))) broken.push(`DEVELOPERS.md → ${target}`);
    if (OUTSIDE.test(GUIDE)) broken.push("DEVELOPERS.md names a file outside the repository");
    for (const name of DOCS) {
      const file = join(ROOT, "docs", name);
      const text = readFileSync(file, "utf8");
      for (const target of relativeLinks(text)) if (!existsSync(join(dirname(file), target))) broken.push(`docs/${name} → ${target}`);
      if (OUTSIDE.test(text)) broken.push(`docs/${name} names a file outside the repository`);
    }
    expect(broken).toEqual([]);
  });
});
