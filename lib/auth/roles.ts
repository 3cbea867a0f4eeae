/** The roles a member can have in a builder account (admin, designer, reviewer, purchasing, viewer). */
export const ROLES = ["admin", "designer", "reviewer", "purchasing", "viewer"] as const;
export type Role = (typeof ROLES)[number];
