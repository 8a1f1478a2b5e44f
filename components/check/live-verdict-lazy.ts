"use client";
/**
 * The live verdict (the core, the verdict panel and the side view) is a large part of the check screen's
 * script and has nothing to show before the page is interactive: it loads as its own chunk right after the
 * page, so the first load carries the form (tests/e2e/page-weight.e2e.ts holds the budget). Component tests
 * replace this module with the component itself, so they render it at once.
 */
import dynamic from "next/dynamic";

export const LiveVerdict = dynamic(() => import("./live-verdict").then((m) => m.LiveVerdict), { ssr: false });
