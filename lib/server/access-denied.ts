import "server-only";

/**
 * Thrown by the data layer when the caller's role lacks the permission it names (the message is the
 * permission, e.g. "checks.save"). Every lib/server module re-checks the role itself, so a route or action
 * that forgot to authorize still cannot read or write; callers authorize first and never show this message.
 */
export class AccessDenied extends Error {}
