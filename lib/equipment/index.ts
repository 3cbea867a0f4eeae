export * from "./catalog";
export * from "./select";
