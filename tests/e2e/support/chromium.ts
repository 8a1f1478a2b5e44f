export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";

export function chromiumMissingMessage() {
  return [
    `The browser tests need Debian's chromium at ${CHROMIUM_PATH}, and it is not there.`,
    "Install it with:  npm run setup:browser   (Debian's package through apt-get; the same script CI runs)",
    "(or point CHROMIUM_PATH at another chromium binary). Browser tests are never skipped.",
  ].join("\n");
}
