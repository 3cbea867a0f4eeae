import type { Role } from "./roles";

/**
 * What each role may do. Reading is open to every member; each write names the permission it
 * needs, and the server checks it even when the page already hides the control.
 */
export const PERMISSIONS = {
  read: ["admin", "designer", "reviewer", "purchasing", "viewer"],
  "team.manage": ["admin"],
  "account.settings": ["admin"],
  "plans.edit": ["admin", "designer"],
  "plans.approve": ["reviewer"],
  "communities.edit": ["admin", "designer"],
  "lots.edit": ["admin", "designer"],
  "lots.permit": ["admin", "designer", "reviewer"],
  "equipment.edit": ["admin", "purchasing"],
  "equipment.override": ["admin", "purchasing"],
  "schedules.export": ["admin", "designer", "reviewer", "purchasing"],
  "imports.read": ["admin", "designer", "reviewer", "purchasing", "viewer"],
  /** The development mailbox (demo and test runs only, lib/mail/mailbox.ts): invitation links are in it. */
  "mailbox.read": ["admin"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export const ROLE_LABELS: Record<Role, string> = {
  admin: "Admin",
  designer: "Designer",
  reviewer: "Reviewer",
  purchasing: "Purchasing",
  viewer: "Viewer",
};

export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  admin: "Runs the account: team, communities, settings.",
  designer: "Keeps the plan library and the lots.",
  reviewer: "Checks calculations and approves plan revisions.",
  purchasing: "Keeps the equipment catalog and schedules.",
  viewer: "Reads everything, changes nothing.",
};

export function can(role: Role, permission: Permission): boolean {
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}

export function permissionsOf(role: Role): Permission[] {
  return (Object.keys(PERMISSIONS) as Permission[]).filter((p) => can(role, p));
}
