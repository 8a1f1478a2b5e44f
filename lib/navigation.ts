import { can, type Permission, type Role } from "./roles";

export interface NavItem {
  href: string;
  label: string;
  permission?: Permission;
  /** Shown only where the local fake mail server is in use. */
  devOnly?: boolean;
}

/** The workspace's sections. Each page re-checks the same permission on the server. */
export const NAV_ITEMS: NavItem[] = [
  { href: "/overview", label: "Overview" },
  { href: "/check", label: "Check a rig", permission: "checks.run" },
  { href: "/checks", label: "Saved checks", permission: "checks.run" },
  { href: "/fleet", label: "Fleet", permission: "fleet.read" },
  { href: "/installations", label: "Installations", permission: "installations.read" },
  { href: "/training", label: "Training", permission: "training.practise" },
  { href: "/team", label: "Team", permission: "team.manage" },
  { href: "/settings", label: "Organisation", permission: "organisation.manage" },
  { href: "/mailbox", label: "Mailbox", permission: "mailbox.read", devOnly: true },
];

export function navigationFor(role: Role, options: { mailbox: boolean }): NavItem[] {
  return NAV_ITEMS.filter((item) => (!item.permission || can(role, item.permission)) && (!item.devOnly || options.mailbox));
}
