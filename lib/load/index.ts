/**
 * Platload load engine: plain data in, plain data out (no React, database or Next.js imports).
 * Results are design estimates; local codes and a licensed professional govern.
 */
export { ENGINE_VERSION, computeFacingLoads, computePlanFacings, type ComputeOptions } from "./procedures";
export * from "./input";
export * from "./errors";
export * from "./results";
