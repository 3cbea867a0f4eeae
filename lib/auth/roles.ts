/** The roles a member can have in a builder account (PRODUCT.md). */
export const ROLES = ["admin", "designer", "reviewer", "purchasing", "viewer"] as const;
export type Role = (typeof ROLES)[number];
