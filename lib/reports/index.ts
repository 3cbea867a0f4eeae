/**
 * Reports: the equipment schedule (counts and costs per system, community and month) and the
 * per-lot load reports as PDF. Pure library code (no database, no Next.js).
 */
export * from "./errors";
export * from "./equipment-schedule";
export * from "./lot-report";
export * from "./procedure-text";
export * from "./procedure-compare";
