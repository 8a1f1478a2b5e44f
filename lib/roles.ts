/**
 * Roles and what each may do. One table, read by the server's access checks and by the navigation,
 * so that what a person sees and what the server allows never drift apart.
 */
export const ROLES = ["owner", "staff", "fleet_manager", "trainer"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  owner: "Owner",
  staff: "Counter staff",
  fleet_manager: "Fleet manager",
  trainer: "Trainer",
};

export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  owner: "Runs the organisation: members, roles, settings, and everything the others can do.",
  staff: "Checks rigs with customers at the counter and shares results.",
  fleet_manager: "Keeps the fleet's vehicles, trailers and accessories and which of them go together.",
  trainer: "Writes worked examples and follows learners' practice.",
};

export const PERMISSIONS = {
  "organisation.manage": ["owner"],
  "team.manage": ["owner"],
  "mailbox.read": ["owner"],
  "checks.run": ["owner", "staff", "fleet_manager", "trainer"],
  "checks.save": ["owner", "staff", "fleet_manager"],
  /** Saving a typed vehicle as a profile from the check screen (editing and archiving is fleet.edit). */
  "profiles.save": ["owner", "staff", "fleet_manager"],
  "fleet.read": ["owner", "staff", "fleet_manager", "trainer"],
  "fleet.edit": ["owner", "fleet_manager"],
  "training.author": ["owner", "trainer"],
  /** Installation records: everyone reads (a fleet manager only the fleet's own vehicles'); the counter and the owner write. */
  "installations.read": ["owner", "staff", "fleet_manager", "trainer"],
  "installations.edit": ["owner", "staff"],
  /** The shop's fitting checklist, defined once. */
  "installations.checklist": ["owner"],
  "training.practise": ["owner", "staff", "fleet_manager", "trainer"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role, permission: Permission): boolean {
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}
