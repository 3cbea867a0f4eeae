/** What can be imported (the imports table's kinds); kept apart so the schema need not load the readers. */
export const IMPORT_KINDS = ["plans", "lots", "equipment"] as const;
export type ImportKind = (typeof IMPORT_KINDS)[number];
