/**
 * Draws the app's icons from public/icon.svg with Debian's chromium and writes the PNGs and favicon.ico into
 * public/. Run after changing the mark: `npx tsx scripts/make-icons.ts` (the files are committed).
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { chromium } from "playwright-core";
import { CHROMIUM_PATH } from "../tests/e2e/support/chromium";

const PUBLIC = join(process.cwd(), "public");
const svg = readFileSync(join(PUBLIC, "icon.svg"), "utf8");

/** A maskable icon keeps its mark inside the middle 80 %: the mark on a full-bleed square of the accent. */
function maskable(size: number): string {
  return `<div style="width:${size}px;height:${size}px;background:#0b6470;display:grid;place-items:center">
    <div style="width:${size * 0.72}px;height:${size * 0.72}px">${svg.replace("<svg ", '<svg width="100%" height="100%" ')}</div></div>`;
}

function plain(size: number): string {
  return `<div style="width:${size}px;height:${size}px">${svg.replace("<svg ", '<svg width="100%" height="100%" ')}</div>`;
}

/** An .ico file may hold PNG images as they are (one directory entry per size). */
function ico(pngs: Array<{ size: number; data: Buffer }>): Buffer {
  const header = Buffer.alloc(6);
  header.writeUInt16LE(0, 0);
  header.writeUInt16LE(1, 2);
  header.writeUInt16LE(pngs.length, 4);
  const entries: Buffer[] = [];
  let offset = 6 + 16 * pngs.length;
  for (const { size, data } of pngs) {
    const entry = Buffer.alloc(16);
    entry.writeUInt8(size >= 256 ? 0 : size, 0);
    entry.writeUInt8(size >= 256 ? 0 : size, 1);
    entry.writeUInt16LE(1, 4);
    entry.writeUInt16LE(32, 6);
    entry.writeUInt32LE(data.length, 8);
    entry.writeUInt32LE(offset, 12);
    offset += data.length;
    entries.push(entry);
  }
  return Buffer.concat([header, ...entries, ...pngs.map((p) => p.data)]);
}

async function main() {
  const profile = mkdtempSync(join(tmpdir(), "towmargin-icons-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: ["--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const shot = async (html: string, size: number) => {
    await page.setViewportSize({ width: size, height: size });
    await page.setContent(`<html><body style="margin:0;background:transparent">${html}</body></html>`);
    return page.screenshot({ omitBackground: true, clip: { x: 0, y: 0, width: size, height: size } });
  };
  try {
    writeFileSync(join(PUBLIC, "icon-192.png"), await shot(plain(192), 192));
    writeFileSync(join(PUBLIC, "icon-512.png"), await shot(plain(512), 512));
    writeFileSync(join(PUBLIC, "icon-maskable-512.png"), await shot(maskable(512), 512));
    writeFileSync(join(PUBLIC, "apple-touch-icon.png"), await shot(maskable(180), 180));
    const small = [16, 32, 48];
    const pngs = [];
    for (const size of small) pngs.push({ size, data: await shot(plain(size), size) });
    writeFileSync(join(PUBLIC, "favicon.ico"), ico(pngs));
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
  }
}

void main();
