/**
 * The spreadsheet layer shared by the plan-library grid, the importers, the exports and the
 * command line: units in cells, cell formulas, CSV/XLSX reading and writing with formula
 * escaping, the plan library's column list and row ↔ PlanInput conversion.
 */
export * from "./units";
export * from "./formula";
export * from "./columns";
export * from "./table-io";
export * from "./plan-columns";
