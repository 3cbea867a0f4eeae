import type { Permission } from "@/lib/auth/permissions";
import type { NavItem } from "./nav-links";

/** The workbook's pages, and the permission a role needs to see each in the navigation. */
export const NAV_ITEMS: (NavItem & { permission: Permission })[] = [
  { href: "/plans", label: "Plans", permission: "read" },
  { href: "/communities", label: "Communities", permission: "read" },
  { href: "/equipment", label: "Equipment", permission: "read" },
  { href: "/schedules", label: "Schedules", permission: "read" },
  { href: "/imports", label: "Imports", permission: "imports.read" },
  { href: "/history", label: "History", permission: "read" },
  { href: "/team", label: "Team", permission: "read" },
  { href: "/account", label: "Account", permission: "read" },
];
