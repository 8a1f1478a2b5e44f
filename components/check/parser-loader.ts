/**
 * The rig's schema (zod and every field's rule) is loaded after the check screen itself, as its own chunk: the
 * form is on screen and can be typed in before it arrives, and the first check of the values waits for it.
 * One load per page; `loadedParser()` answers at once once it is in (a save or a profile needs the rig now).
 */
type Parser = typeof import("./parse-candidate");

let loaded: Parser | undefined;
let loading: Promise<Parser> | undefined;

export function loadParser(): Promise<Parser> {
  loading ??= import("./parse-candidate").then((module) => (loaded = module));
  return loading;
}

export function loadedParser(): Parser | undefined {
  return loaded;
}
