"use client";

import { AllCommunityModule, ModuleRegistry, themeQuartz } from "ag-grid-community";

ModuleRegistry.registerModules([AllCommunityModule]);

/** Platload's grid look: dense, neutral, the accent for focus and selection. No web fonts are loaded. */
export const gridTheme = themeQuartz.withParams({
  fontFamily: "inherit",
  fontSize: 12,
  headerFontSize: 12,
  spacing: 4,
  rowHeight: 28,
  headerHeight: 30,
  accentColor: "#1f6f68",
  headerBackgroundColor: "#f4f4f5",
  borderColor: "#e4e4e7",
  wrapperBorderRadius: 4,
});

export const fmtInt = (v: number | null | undefined) =>
  v === null || v === undefined || !Number.isFinite(v) ? "" : Math.round(v).toLocaleString("en-US");
export const fmtNum = (v: number | null | undefined, digits = 2) =>
  v === null || v === undefined || !Number.isFinite(v)
    ? ""
    : v.toLocaleString("en-US", { maximumFractionDigits: digits, minimumFractionDigits: 0 });
