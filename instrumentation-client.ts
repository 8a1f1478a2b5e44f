import { config } from "zod/v4/core";

// Runs before the app in the browser. zod compiles object parsers with `new Function` when it may; the page's
// Content-Security-Policy (proxy.ts) allows no eval, so probing for it would log a violation. Parse without it.
config({ jitless: true });
