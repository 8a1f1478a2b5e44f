/**
 * Print every local rule with its source as Markdown: `npx tsx scripts/rules-table.ts > docs/local-rules-table.md`.
 * A unit test checks that docs/local-rules.md names every rule id.
 */
import { RULE_SETS } from "../lib/towing/rules/places";
import type { RuleRow } from "../lib/towing/rules/types";

function threshold(row: RuleRow): string {
  if (!("threshold" in row) || !row.threshold) return "—";
  const t = row.threshold;
  const word = t.applies === "above" ? "over" : "from";
  return `${word} ${t.value.toLocaleString("en-US")} ${t.unit} (${t.of === "gtm" ? "GTM" : "laden"})`;
}

const lines: string[] = [];
for (const set of Object.values(RULE_SETS)) {
  lines.push(`### ${set.title} (\`${set.id}\`, version ${set.version})`, "", set.scope, "");
  lines.push("| Rule | Kind | Threshold | Requires | Source |", "|---|---|---|---|---|");
  for (const row of set.rules) {
    const src = [row.source.title, row.source.ref].filter(Boolean).join(", ") + ` (${row.source.trust}${row.source.note ? `; ${row.source.note}` : ""})`;
    lines.push(`| \`${row.id}\` | ${row.kind} | ${threshold(row)} | ${row.requires.replace(/\|/g, "\\|")} | ${src.replace(/\|/g, "\\|")} |`);
  }
  lines.push("");
}
process.stdout.write(lines.join("\n"));
