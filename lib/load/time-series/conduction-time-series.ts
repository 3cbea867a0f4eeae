/**
 * Conduction time series (CTS) of the 2021 ASHRAE Handbook—Fundamentals, SI edition, ch. 18 §6.4,
 * read in a stored Markdown copy of the chapter:
 *
 * - heat input at the outside of a wall or roof n hours ago: q_i,θ−n = U·A·(t_e,θ−n − t_rc)
 *   (eq. 30), t_e the sol-air temperature (eq. 29), t_rc the constant room air temperature;
 * - heat gain indoors this hour: q_θ = c₀·q_i,θ + c₁·q_i,θ−1 + … + c₂₃·q_i,θ−23 (eq. 31), with the
 *   conduction time factors c_j of Table 16 (walls) or Table 17 (roofs), computed by the chapter
 *   from periodic response factors divided by the U-factor, on constructions whose layers are in
 *   Table 18. "For walls and roofs that are not reasonably close to the representative
 *   constructions in Tables 16 and 17, CTS coefficients may be computed with a computer program";
 *   we map our base assemblies to the nearest printed construction instead (below).
 *
 * As read (the stored copy, a conversion of the printed PDF, says to check values against the PDF):
 * - factors are printed to 0.1 %; the "Total Percentage" row prints 100 but the printed factors sum
 *   to 99.7–100.5 %. Each series must total 100 % by definition (§6.2), so `conductionTimeSeries`
 *   divides the printed factors by their own sum;
 * - Table 16 labels its rows hour 0–23, Table 17 labels them 1–24: both are read as c₀…c₂₃ (the
 *   first row is the current hour: roof 5, a bare metal roof, puts 26.6 % there);
 * - `printedU` and `printedTotalR` are as printed, W/(m²·K) and m²·K/W, except walls 58–66 and roof 6,
 *   whose printed figures are in IP units (h·ft²·°F/Btu: their Table 18 layer sums × 5.678 give the
 *   printed R), flagged `printedUnits: "IP"`. The engine takes its U-factors from
 *   lib/load/assemblies.ts, never from these columns;
 * - other oddities are listed in CTS_READING_NOTES.
 */
import { LoadInputError } from "../errors";
import type { BaseAssembly } from "../input";
import { checkSeries, convolveDay, HOURS_PER_DAY } from "./radiant-time-series";

/**
 * HoF 2021 ch. 18 Table 18 "Thermal Properties and Code Numbers of Layers Used in Wall and Roof
 * Descriptions for Tables 16 and 17": resistance R, m²·K/W, and mass, kg/m², as read.
 */
export const CTS_LAYERS: Readonly<
  Record<string, { description: string; rM2KPerW: number; massKgPerM2: number }>
> = {
  F01: { description: "Outdoor surface resistance", rM2KPerW: 0.04, massKgPerM2: 0 },
  F02: { description: "Indoor vertical surface resistance", rM2KPerW: 0.12, massKgPerM2: 0 },
  F03: { description: "Indoor horizontal surface resistance", rM2KPerW: 0.16, massKgPerM2: 0 },
  F04: { description: "Wall air space resistance", rM2KPerW: 0.15, massKgPerM2: 0 },
  F05: { description: "Ceiling air space resistance", rM2KPerW: 0.18, massKgPerM2: 0 },
  F06: { description: "EIFS finish", rM2KPerW: 0.01, massKgPerM2: 17.7 },
  F07: { description: "25 mm stucco", rM2KPerW: 0.04, massKgPerM2: 47.2 },
  F08: { description: "Metal surface", rM2KPerW: 0.0, massKgPerM2: 6.0 },
  F09: { description: "Opaque spandrel glass", rM2KPerW: 0.01, massKgPerM2: 16.1 },
  F10: { description: "25 mm stone", rM2KPerW: 0.01, massKgPerM2: 65.1 },
  F11: { description: "Wood siding", rM2KPerW: 0.14, massKgPerM2: 7.5 },
  F12: { description: "Asphalt shingles", rM2KPerW: 0.08, massKgPerM2: 3.6 },
  F13: { description: "Built-up roofing", rM2KPerW: 0.06, massKgPerM2: 10.7 },
  F14: { description: "Slate or tile", rM2KPerW: 0.01, massKgPerM2: 24.4 },
  F15: { description: "Wood shingles", rM2KPerW: 0.17, massKgPerM2: 3.8 },
  F16: { description: "Acoustic tile", rM2KPerW: 0.31, massKgPerM2: 7.0 },
  F17: { description: "Carpet", rM2KPerW: 0.22, massKgPerM2: 3.7 },
  F18: { description: "Terrazzo", rM2KPerW: 0.01, massKgPerM2: 65.1 },
  G01: { description: "16 mm gyp board", rM2KPerW: 0.1, massKgPerM2: 12.7 },
  G02: { description: "16 mm plywood", rM2KPerW: 0.14, massKgPerM2: 8.6 },
  G03: { description: "13 mm fiberboard sheathing", rM2KPerW: 0.19, massKgPerM2: 5.1 },
  G04: { description: "13 mm wood", rM2KPerW: 0.08, massKgPerM2: 7.7 },
  G05: { description: "25 mm wood", rM2KPerW: 0.17, massKgPerM2: 15.5 },
  G06: { description: "50 mm wood", rM2KPerW: 0.33, massKgPerM2: 30.9 },
  G07: { description: "100 mm wood", rM2KPerW: 0.66, massKgPerM2: 61.8 },
  I01: { description: "25 mm insulation board", rM2KPerW: 0.88, massKgPerM2: 1.1 },
  I02: { description: "50 mm insulation board", rM2KPerW: 1.76, massKgPerM2: 2.2 },
  I03: { description: "75 mm insulation board", rM2KPerW: 2.64, massKgPerM2: 3.3 },
  I04: { description: "89 mm batt insulation", rM2KPerW: 1.94, massKgPerM2: 1.7 },
  I05: { description: "154 mm batt insulation", rM2KPerW: 3.34, massKgPerM2: 3.0 },
  I06: { description: "244 mm batt insulation", rM2KPerW: 5.28, massKgPerM2: 4.7 },
  M01: { description: "100 mm brick", rM2KPerW: 0.11, massKgPerM2: 195.2 },
  M02: { description: "150 mm LW concrete block", rM2KPerW: 0.31, massKgPerM2: 78.1 },
  M03: { description: "200 mm LW concrete block", rM2KPerW: 0.41, massKgPerM2: 94.3 },
  M04: { description: "300 mm LW concrete block", rM2KPerW: 0.43, massKgPerM2: 156.2 },
  M05: { description: "200 mm concrete block", rM2KPerW: 0.18, massKgPerM2: 162.7 },
  M06: { description: "300 mm concrete block", rM2KPerW: 0.22, massKgPerM2: 244.0 },
  M07: { description: "150 mm LW concrete block (filled)", rM2KPerW: 0.53, massKgPerM2: 78.1 },
  M08: { description: "200 mm LW concrete block (filled)", rM2KPerW: 0.78, massKgPerM2: 94.3 },
  M09: { description: "300 mm LW concrete block (filled)", rM2KPerW: 1.04, massKgPerM2: 156.2 },
  M10: { description: "200 mm concrete block (filled)", rM2KPerW: 0.28, massKgPerM2: 162.7 },
  M11: { description: "100 mm lightweight concrete", rM2KPerW: 0.19, massKgPerM2: 130.1 },
  M12: { description: "150 mm lightweight concrete", rM2KPerW: 0.29, massKgPerM2: 195.2 },
  M13: { description: "200 mm lightweight concrete", rM2KPerW: 0.38, massKgPerM2: 260.3 },
  M14: { description: "150 mm heavyweight concrete", rM2KPerW: 0.08, massKgPerM2: 341.6 },
  M15: { description: "200 mm heavyweight concrete", rM2KPerW: 0.1, massKgPerM2: 455.5 },
  M16: { description: "300 mm heavyweight concrete", rM2KPerW: 0.16, massKgPerM2: 683.2 },
  M17: { description: "50 mm LW concrete roof ballast", rM2KPerW: 0.27, massKgPerM2: 32.5 },
};

/** One printed construction of HoF 2021 ch. 18 Table 16 (walls) or Table 17 (roofs). */
export interface PrintedConstruction {
  number: number;
  /** The column heading as printed (abbreviations kept). */
  description: string;
  /** Printed U-factor, W/(m²·K) (IP, Btu/h·ft²·°F, where `printedUnits` is "IP"). */
  printedU: number;
  /** Printed total R including films, m²·K/W (IP, h·ft²·°F/Btu, where `printedUnits` is "IP"). */
  printedTotalR: number;
  printedUnits?: "IP";
  /** Table 18 layer codes, outdoors to indoors. */
  layers: readonly string[];
  /** Conduction time factors as printed, %, index 0 = the current hour. */
  factorsPct: readonly number[];
}

/**
 * What the stored copy shows that does not add up; kept as read (tests/unit/load/time-series.test.ts
 * checks each one the stored data can show, all but the hour labels, so the list cannot go stale).
 */
export const CTS_READING_NOTES = {
  wall5Layers:
    "Table 16 wall 5 lists I02 (50 mm board) where walls 1 and 3 have G01 (gypsum); its layer sum is 3.99 against the printed total R 2.33, which G01 would give.",
  wall38TotalR:
    "Table 16 wall 38: the layers sum to 2.59 m²·K/W against the printed 2.82 (the same as wall 36's).",
  roof20TotalR: "Table 17 roof 20: the layers sum to 4.46 m²·K/W against the printed 5.32.",
  roof31TotalR: "Table 17 roof 31: the layers sum to 6.11 m²·K/W against the printed 5.92.",
  roof23SameAsRoof1:
    "Table 17 roof 23 (membrane, R-4.4 board, metal deck) prints roof 1's layers, U, total R and factors.",
  ipUnits:
    "Walls 58–66 and roof 6 print U and total R in IP units in the SI edition (layer sums × 5.678 give the printed R).",
  wall7Label:
    "Wall 7 is headed 'R-.9 batt' but its layers hold the 89 mm batt I04 (R 1.94), like walls 9, 11 and 13 headed R-1.9.",
  walls11and12Label:
    "Walls 11 and 12 are headed '12.5 mm wood' inside but list G01 (16 mm gypsum board) as the inner layer.",
  roofHourLabels:
    "Table 17 labels its rows 1–24 where Table 16 labels them 0–23; the first row is read as c₀.",
} as const;

/** HoF 2021 ch. 18 Table 16 "Wall Conduction Time Series (CTS)", walls 1–66, as read. */
export const WALL_CTS: readonly PrintedConstruction[] = [
  {
    number: 1,
    description: "Spandrel glass, R-1.8 insulation board, gyp. board",
    printedU: 0.43,
    printedTotalR: 2.33,
    layers: ["F01", "F09", "F04", "I02", "F04", "G01", "F02"],
    factorsPct: [
      18.0, 57.1, 19.8, 4.0, 0.8, 0.2, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 2,
    description: "Spandrel glass, R-3.5 insulation board, gyp. board",
    printedU: 0.245,
    printedTotalR: 4.08,
    layers: ["F01", "F09", "F04", "I02", "I02", "F04", "G01", "F02"],
    factorsPct: [
      3.4, 35.9, 36.8, 15.9, 5.5, 1.8, 0.6, 0.2, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 3,
    description: "Metal wall panel, R-1.8 insulation board, gyp. board",
    printedU: 0.431,
    printedTotalR: 2.32,
    layers: ["F01", "F08", "F04", "I02", "F04", "G01", "F02"],
    factorsPct: [
      25.0, 56.1, 15.2, 3.0, 0.6, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 4,
    description: "Metal wall panel, R-3.5 insulation board, gyp. board",
    printedU: 0.246,
    printedTotalR: 4.07,
    layers: ["F01", "F08", "F04", "I02", "I02", "F04", "G01", "F02"],
    factorsPct: [
      5.4, 40.9, 33.8, 13.4, 4.5, 1.4, 0.4, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 5,
    description: "25 mm stone, R-1.8 insulation board, gyp. board",
    printedU: 0.429,
    printedTotalR: 2.33,
    layers: ["F01", "F10", "F04", "I02", "F04", "I02", "F02"],
    factorsPct: [
      8.3, 44.0, 31.2, 11.6, 3.5, 1.0, 0.3, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 6,
    description: "25 mm stone, R-3.5 insulation board, gyp. board",
    printedU: 0.245,
    printedTotalR: 4.08,
    layers: ["F01", "F10", "F04", "I02", "I02", "F04", "G01", "F02"],
    factorsPct: [
      1.4, 22.3, 35.9, 23.2, 10.7, 4.2, 1.5, 0.5, 0.2, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 7,
    description: "Metal wall panel, sheathing, R-.9 batt insulation, gyp. board",
    printedU: 0.418,
    printedTotalR: 2.39,
    layers: ["F01", "F08", "G03", "I04", "G01", "F02"],
    factorsPct: [
      19.3, 57.5, 18.7, 3.7, 0.7, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 8,
    description: "Metal wall panel, sheathing, R-3.9 batt insulation, gyp. board",
    printedU: 0.231,
    printedTotalR: 4.34,
    layers: ["F01", "F08", "G03", "I04", "I04", "G01", "F02"],
    factorsPct: [
      5.6, 45.0, 34.4, 11.1, 2.9, 0.7, 0.2, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 9,
    description: "25 mm stone, sheathing, R-1.9 batt insulation, gyp. board",
    printedU: 0.416,
    printedTotalR: 2.4,
    layers: ["F01", "F10", "G03", "I04", "G01", "F02"],
    factorsPct: [
      6.5, 41.1, 32.7, 13.3, 4.5, 1.4, 0.4, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 10,
    description: "25 mm stone, sheathing, R-3.9 batt insulation, gyp. board",
    printedU: 0.23,
    printedTotalR: 4.35,
    layers: ["F01", "F10", "G03", "I04", "I04", "G01", "F02"],
    factorsPct: [
      1.6, 24.9, 37.3, 21.9, 9.2, 3.4, 1.2, 0.4, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 11,
    description: "Wood siding, sheathing, R-1.9 batt insulation, 12.5 mm wood",
    printedU: 0.402,
    printedTotalR: 2.49,
    layers: ["F01", "F11", "G02", "I04", "G01", "F02"],
    factorsPct: [
      6.4, 40.7, 32.4, 13.5, 4.7, 1.6, 0.5, 0.2, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 12,
    description: "Wood siding, sheathing, R-3.9 batt insulation, 12.5 mm wood",
    printedU: 0.226,
    printedTotalR: 4.43,
    layers: ["F01", "F11", "G02", "I04", "I04", "G01", "F02"],
    factorsPct: [
      1.5, 24.3, 36.3, 21.9, 9.8, 3.9, 1.5, 0.5, 0.2, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 13,
    description: "25 mm stucco, sheathing, R-1.9 batt insulation, gyp. board",
    printedU: 0.412,
    printedTotalR: 2.43,
    layers: ["F01", "F07", "G03", "I04", "G01", "F02"],
    factorsPct: [
      5.7, 40.4, 33.6, 13.7, 4.6, 1.4, 0.4, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 14,
    description: "25 mm stucco, sheathing, R-3.9 batt insulation, gyp. board",
    printedU: 0.229,
    printedTotalR: 4.37,
    layers: ["F01", "F07", "G03", "I04", "I04", "G01", "F02"],
    factorsPct: [
      1.3, 23.8, 37.6, 22.5, 9.6, 3.5, 1.2, 0.4, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 15,
    description: "EIFS, R-0.9 insulation board, sheathing, gyp. board",
    printedU: 0.67,
    printedTotalR: 1.49,
    layers: ["F01", "F06", "I01", "G03", "F04", "G01", "F02"],
    factorsPct: [
      11.9, 48.8, 26.3, 8.8, 2.8, 0.9, 0.3, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 16,
    description: "EIFS, R-1.8 insulation board, sheathing, gyp. board",
    printedU: 0.422,
    printedTotalR: 2.37,
    layers: ["F01", "F06", "I01", "I01", "G03", "F04", "G01", "F02"],
    factorsPct: [
      6.0, 40.7, 31.6, 13.2, 5.1, 2.0, 0.8, 0.3, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 17,
    description: "EIFS, R-0.9 insulation board, sheathing, R-1.9 batt insulation, gyp. board",
    printedU: 0.305,
    printedTotalR: 3.28,
    layers: ["F01", "F06", "I01", "G03", "I04", "G01", "F02"],
    factorsPct: [
      2.6, 25.2, 30.7, 19.5, 10.6, 5.5, 2.9, 1.5, 0.8, 0.4, 0.2, 0.1, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 18,
    description: "EIFS, R-0.9 insulation board, sheathing, R-3.9 batt insulation, gyp. board",
    printedU: 0.191,
    printedTotalR: 5.23,
    layers: ["F01", "F06", "I01", "G03", "I04", "I04", "G01", "F02"],
    factorsPct: [
      0.5, 11.9, 25.9, 22.9, 15.4, 9.5, 5.7, 3.4, 2.0, 1.2, 0.7, 0.4, 0.2, 0.1, 0.1, 0.1, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 19,
    description: "EIFS, R0.9 insulation board, sheathing, 200 mm LW CMU, gyp. board",
    printedU: 0.526,
    printedTotalR: 1.9,
    layers: ["F01", "F06", "I01", "G03", "M03", "F04", "G01", "F02"],
    factorsPct: [
      1.0, 2.0, 5.8, 8.7, 9.3, 8.9, 8.1, 7.2, 6.5, 5.7, 5.1, 4.5, 4.0, 3.6, 3.2, 2.8, 2.5, 2.2, 2.0, 1.8, 1.6,
      1.4, 1.2, 1.1,
    ],
  },
  {
    number: 20,
    description: "EIFS, R-1.8 insulation board, sheathing, 200 mm LW CMU, gyp. board",
    printedU: 0.36,
    printedTotalR: 2.78,
    layers: ["F01", "F06", "I01", "I01", "G03", "M03", "F04", "G01", "F02"],
    factorsPct: [
      1.3, 1.8, 4.5, 7.3, 8.3, 8.2, 7.7, 7.0, 6.4, 5.8, 5.3, 4.8, 4.3, 3.9, 3.5, 3.2, 2.9, 2.6, 2.4, 2.1, 1.9,
      1.8, 1.6, 1.4,
    ],
  },
  {
    number: 21,
    description: "Brick, R-0.9 insulation board, sheathing, gyp. board",
    printedU: 0.573,
    printedTotalR: 1.75,
    layers: ["F01", "M01", "F04", "I01", "G03", "F04", "G01", "F02"],
    factorsPct: [
      0.2, 4.8, 13.9, 16.7, 14.9, 12.0, 9.2, 7.0, 5.3, 4.0, 3.0, 2.3, 1.7, 1.3, 1.0, 0.7, 0.5, 0.4, 0.3, 0.2,
      0.2, 0.1, 0.1, 0.1,
    ],
  },
  {
    number: 22,
    description: "Brick, R-1.8 insulation board, sheathing, gyp. board",
    printedU: 0.381,
    printedTotalR: 2.62,
    layers: ["F01", "M01", "F04", "I01", "I01", "G03", "F04", "G01", "F02"],
    factorsPct: [
      0.1, 3.0, 11.1, 15.5, 15.0, 12.7, 10.1, 7.8, 6.0, 4.6, 3.5, 2.6, 2.0, 1.5, 1.1, 0.9, 0.7, 0.5, 0.4, 0.3,
      0.2, 0.2, 0.1, 0.1,
    ],
  },
  {
    number: 23,
    description: "Brick, sheathing, R-1.9 batt insulation, gyp. board",
    printedU: 0.376,
    printedTotalR: 2.66,
    layers: ["F01", "M01", "F04", "G03", "I04", "G01", "F02"],
    factorsPct: [
      0.2, 4.1, 13.3, 16.6, 14.8, 11.8, 9.2, 7.1, 5.4, 4.2, 3.2, 2.4, 1.9, 1.4, 1.1, 0.8, 0.6, 0.5, 0.4, 0.3,
      0.2, 0.2, 0.1, 0.1,
    ],
  },
  {
    number: 24,
    description: "Brick, sheathing, R-3.9 batt insulation, gyp. board",
    printedU: 0.217,
    printedTotalR: 4.6,
    layers: ["F01", "M01", "F04", "G03", "I04", "I04", "G01", "F02"],
    factorsPct: [
      0.1, 1.6, 8.5, 14.5, 15.2, 13.1, 10.6, 8.3, 6.5, 5.0, 3.9, 3.0, 2.3, 1.8, 1.4, 1.1, 0.8, 0.6, 0.5, 0.4,
      0.3, 0.2, 0.2, 0.1,
    ],
  },
  {
    number: 25,
    description: "Brick, R-0.9 insulation board, sheathing, R-1.9 batt insulation, gyp. board",
    printedU: 0.283,
    printedTotalR: 3.54,
    layers: ["F01", "M01", "F04", "I01", "G03", "I04", "G01", "F02"],
    factorsPct: [
      0.1, 1.5, 6.8, 11.7, 13.3, 12.7, 11.1, 9.2, 7.5, 5.9, 4.7, 3.6, 2.8, 2.2, 1.7, 1.3, 1.0, 0.8, 0.6, 0.5,
      0.4, 0.3, 0.2, 0.2,
    ],
  },
  {
    number: 26,
    description: "Brick, R-0.9 insulation board, sheathing, R-3.9 batt insulation, gyp. board",
    printedU: 0.157,
    printedTotalR: 6.36,
    layers: ["F01", "M01", "F04", "I01", "I01", "G03", "I04", "I04", "G01", "F02"],
    factorsPct: [
      0.4, 0.5, 2.0, 5.3, 8.2, 9.7, 10.1, 9.6, 8.8, 7.8, 6.8, 5.8, 4.9, 4.1, 3.4, 2.8, 2.3, 1.9, 1.5, 1.2,
      1.0, 0.8, 0.6, 0.5,
    ],
  },
  {
    number: 27,
    description: "Brick, R-0.9 insulation board, 200 mm LW CMU",
    printedU: 0.583,
    printedTotalR: 1.75,
    layers: ["F01", "M01", "F04", "I01", "M03", "F02"],
    factorsPct: [
      0.6, 0.8, 2.6, 5.5, 7.6, 8.7, 9.0, 8.7, 8.2, 7.4, 6.6, 5.8, 5.0, 4.3, 3.7, 3.1, 2.6, 2.2, 1.9, 1.6, 1.3,
      1.1, 0.9, 0.7,
    ],
  },
  {
    number: 28,
    description: "Brick, R-1.8 insulation board, 200 mm LW CMU",
    printedU: 0.386,
    printedTotalR: 2.59,
    layers: ["F01", "M01", "F04", "I01", "I01", "M03", "F02"],
    factorsPct: [
      0.8, 0.8, 2.1, 4.5, 6.6, 7.9, 8.4, 8.4, 8.0, 7.4, 6.7, 6.0, 5.3, 4.7, 4.1, 3.5, 3.0, 2.6, 2.2, 1.9, 1.6,
      1.4, 1.1, 1.0,
    ],
  },
  {
    number: 29,
    description: "Brick, 200 mm LW CMU, R-1.9 batt insulation, gyp. board",
    printedU: 0.347,
    printedTotalR: 2.88,
    layers: ["F01", "M01", "F04", "M03", "I04", "G01", "F02"],
    factorsPct: [
      1.6, 1.5, 1.9, 3.3, 5.0, 6.2, 6.9, 7.1, 7.0, 6.7, 6.3, 5.9, 5.4, 5.0, 4.5, 4.1, 3.7, 3.4, 3.0, 2.7, 2.5,
      2.2, 2.0, 1.8,
    ],
  },
  {
    number: 30,
    description: "Brick, 200 mm LW CMU, R-3.9 batt insulation, gyp. board",
    printedU: 0.207,
    printedTotalR: 4.83,
    layers: ["F01", "M01", "F04", "M03", "I04", "I04", "G01", "F02"],
    factorsPct: [
      1.9, 1.8, 1.8, 2.7, 4.0, 5.4, 6.2, 6.7, 6.8, 6.6, 6.4, 6.0, 5.6, 5.2, 4.8, 4.4, 4.0, 3.7, 3.4, 3.1, 2.8,
      2.5, 2.3, 2.1,
    ],
  },
  {
    number: 31,
    description: "Brick, R-0.9 insulation board, 200 mm HW CMU, gyp. board",
    printedU: 0.63,
    printedTotalR: 1.59,
    layers: ["F01", "M01", "F04", "I01", "M05", "G01", "F02"],
    factorsPct: [
      1.8, 1.7, 2.4, 3.8, 5.1, 6.0, 6.5, 6.6, 6.6, 6.4, 6.1, 5.7, 5.3, 4.9, 4.6, 4.2, 3.8, 3.5, 3.2, 2.9, 2.6,
      2.4, 2.1, 1.9,
    ],
  },
  {
    number: 32,
    description: "Brick, R-1.8 insulation board, 200 mm HW CMU, gyp. board",
    printedU: 0.406,
    printedTotalR: 2.46,
    layers: ["F01", "M01", "F04", "I01", "I01", "M05", "G01", "F02"],
    factorsPct: [
      2.0, 1.9, 2.3, 3.4, 4.6, 5.5, 6.1, 6.3, 6.3, 6.2, 6.0, 5.7, 5.4, 5.0, 4.7, 4.3, 4.0, 3.7, 3.4, 3.1, 2.9,
      2.6, 2.4, 2.2,
    ],
  },
  {
    number: 33,
    description: "Brick, R-0.9 insulation board, brick",
    printedU: 0.704,
    printedTotalR: 1.42,
    layers: ["F01", "M01", "F04", "I01", "M01", "F02"],
    factorsPct: [
      0.9, 1.3, 3.3, 5.8, 7.3, 8.0, 8.2, 7.9, 7.5, 6.9, 6.2, 5.6, 5.0, 4.4, 3.8, 3.3, 2.9, 2.5, 2.2, 1.9, 1.6,
      1.4, 1.2, 1.0,
    ],
  },
  {
    number: 34,
    description: "Brick, R-1.8 insulation board, brick",
    printedU: 0.436,
    printedTotalR: 2.3,
    layers: ["F01", "M01", "F04", "I01", "I01", "M01", "F02"],
    factorsPct: [
      1.0, 1.2, 2.8, 5.0, 6.6, 7.5, 7.8, 7.7, 7.4, 6.9, 6.4, 5.8, 5.2, 4.6, 4.1, 3.6, 3.2, 2.8, 2.4, 2.1, 1.8,
      1.6, 1.4, 1.2,
    ],
  },
  {
    number: 35,
    description: "Brick, R-0.9 insulation board, 200 mm LW concrete, gyp. board",
    printedU: 0.515,
    printedTotalR: 1.94,
    layers: ["F01", "M01", "F04", "I01", "M13", "F04", "G01", "F02"],
    factorsPct: [
      3.3, 3.1, 3.0, 3.1, 3.4, 3.8, 4.2, 4.6, 4.8, 5.0, 5.1, 5.1, 5.1, 5.0, 4.9, 4.7, 4.6, 4.4, 4.2, 4.1, 3.9,
      3.7, 3.6, 3.4,
    ],
  },
  {
    number: 36,
    description: "Brick, R-1.8 insulation board, 200 mm LW concrete, gyp. board",
    printedU: 0.355,
    printedTotalR: 2.82,
    layers: ["F01", "M01", "F04", "I01", "I01", "M13", "F04", "G01", "F02"],
    factorsPct: [
      3.4, 3.3, 3.2, 3.2, 3.4, 3.7, 4.1, 4.4, 4.6, 4.8, 4.9, 5.0, 4.9, 4.9, 4.8, 4.7, 4.6, 4.4, 4.3, 4.1, 4.0,
      3.9, 3.7, 3.6,
    ],
  },
  {
    number: 37,
    description: "Brick, R-0.9 insulation board, 300 mm HW concrete, gyp. board",
    printedU: 0.549,
    printedTotalR: 1.82,
    layers: ["F01", "M01", "F04", "I01", "M16", "F04", "G01", "F02"],
    factorsPct: [
      3.8, 3.8, 3.7, 3.7, 3.8, 3.9, 4.1, 4.2, 4.3, 4.4, 4.5, 4.5, 4.6, 4.6, 4.5, 4.5, 4.3, 4.3, 4.2, 4.2, 4.1,
      4.0, 4.0, 3.9,
    ],
  },
  {
    number: 38,
    description: "Brick, R-1.8 insulation board, 300 mm HW concrete, gyp. board",
    printedU: 0.355,
    printedTotalR: 2.82,
    layers: ["F01", "M01", "F04", "I01", "I01", "M16", "F04", "G01", "F02"],
    factorsPct: [
      3.9, 3.8, 3.8, 3.8, 3.8, 3.9, 4.0, 4.2, 4.3, 4.4, 4.5, 4.5, 4.5, 4.5, 4.5, 4.5, 4.3, 4.3, 4.2, 4.2, 4.1,
      4.1, 4.0, 3.9,
    ],
  },
  {
    number: 39,
    description: "Brick, 200 mm HW concrete, R-1.9 batt insulation, gyp. board",
    printedU: 0.383,
    printedTotalR: 2.61,
    layers: ["F01", "M01", "F04", "M15", "I04", "G01", "F02"],
    factorsPct: [
      3.4, 3.3, 3.3, 3.6, 4.0, 4.4, 4.7, 4.8, 4.9, 4.9, 4.9, 4.8, 4.7, 4.6, 4.5, 4.4, 4.2, 4.1, 4.0, 3.9, 3.8,
      3.7, 3.6, 3.5,
    ],
  },
  {
    number: 40,
    description: "Brick, 200 mm HW concrete, R-3.9 batt insulation, gyp. board",
    printedU: 0.217,
    printedTotalR: 4.6,
    layers: ["F01", "M01", "F04", "M15", "I04", "I04", "G01", "F02"],
    factorsPct: [
      3.5, 3.4, 3.3, 3.5, 3.8, 4.2, 4.5, 4.7, 4.8, 4.9, 4.9, 4.8, 4.7, 4.6, 4.5, 4.4, 4.3, 4.2, 4.1, 4.0, 3.9,
      3.8, 3.7, 3.6,
    ],
  },
  {
    number: 41,
    description: "200 mm LW CMU, R-1.9 batt insulation, gyp. board",
    printedU: 0.382,
    printedTotalR: 2.62,
    layers: ["F01", "M03", "I04", "G01", "F02"],
    factorsPct: [
      0.2, 4.6, 13.3, 15.8, 14.0, 11.4, 9.0, 7.0, 5.5, 4.3, 3.4, 2.6, 2.0, 1.6, 1.3, 1.0, 0.8, 0.6, 0.5, 0.4,
      0.3, 0.2, 0.2, 0.1,
    ],
  },
  {
    number: 42,
    description: "200 mm LW CMU, R-3.9 batt insulation, gyp. board",
    printedU: 0.219,
    printedTotalR: 4.56,
    layers: ["F01", "M03", "I04", "I04", "G01", "F02"],
    factorsPct: [
      0.2, 1.9, 8.8, 13.9, 14.1, 12.3, 10.0, 8.1, 6.4, 5.1, 4.1, 3.2, 2.6, 2.1, 1.6, 1.3, 1.0, 0.8, 0.7, 0.5,
      0.4, 0.3, 0.3, 0.2,
    ],
  },
  {
    number: 43,
    description: "200 mm LW CMU w/fill insulation, R-1.9 batt insulation, gyp. board",
    printedU: 0.335,
    printedTotalR: 2.99,
    layers: ["F01", "M08", "I04", "G01", "F02"],
    factorsPct: [
      0.6, 1.6, 5.7, 9.5, 10.8, 10.3, 9.3, 8.1, 7.0, 6.0, 5.1, 4.4, 3.7, 3.2, 2.7, 2.3, 2.0, 1.7, 1.5, 1.2,
      1.1, 0.9, 0.8, 0.7,
    ],
  },
  {
    number: 44,
    description: "200 mm LW CMU w/fill insulation, R-3.9 batt insulation, gyp. board",
    printedU: 0.203,
    printedTotalR: 4.93,
    layers: ["F01", "M08", "I04", "I04", "G01", "F02"],
    factorsPct: [
      0.8, 1.0, 3.4, 7.1, 9.4, 9.8, 9.3, 8.3, 7.4, 6.5, 5.6, 4.9, 4.3, 3.7, 3.2, 2.8, 2.4, 2.1, 1.8, 1.6, 1.4,
      1.2, 1.1, 0.9,
    ],
  },
  {
    number: 45,
    description: "25 mm stucco, 200 mm HW CMU, R-1.9 batt insulation, gyp. board",
    printedU: 0.412,
    printedTotalR: 2.42,
    layers: ["F01", "F07", "M05", "I04", "G01", "F02"],
    factorsPct: [
      0.5, 2.3, 8.0, 11.6, 11.7, 10.5, 9.1, 7.7, 6.5, 5.5, 4.6, 3.9, 3.3, 2.8, 2.3, 2.0, 1.6, 1.4, 1.2, 1.0,
      0.8, 0.7, 0.6, 0.5,
    ],
  },
  {
    number: 46,
    description: "25 mm stucco, 200 mm HW CMU, R-3.9 batt insulation, gyp. board",
    printedU: 0.229,
    printedTotalR: 4.37,
    layers: ["F01", "F07", "M05", "I04", "I04", "G01", "F02"],
    factorsPct: [
      0.5, 1.2, 5.1, 9.6, 11.3, 10.8, 9.6, 8.3, 7.1, 6.0, 5.1, 4.3, 3.7, 3.1, 2.7, 2.3, 1.9, 1.6, 1.4, 1.2,
      1.0, 0.8, 0.7, 0.6,
    ],
  },
  {
    number: 47,
    description: "200 mm LW CMU w/fill insulation",
    printedU: 1.058,
    printedTotalR: 0.95,
    layers: ["F01", "M08", "F02"],
    factorsPct: [
      0.7, 10.4, 20.6, 19.5, 14.8, 10.5, 7.3, 5.0, 3.5, 2.4, 1.6, 1.1, 0.8, 0.5, 0.4, 0.2, 0.2, 0.1, 0.1, 0.1,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 48,
    description: "200 mm LW CMU w/fill insulation, gyp. board",
    printedU: 0.835,
    printedTotalR: 1.2,
    layers: ["F01", "M08", "F04", "G01", "F02"],
    factorsPct: [
      0.2, 3.6, 11.8, 15.5, 14.6, 12.2, 9.7, 7.5, 5.8, 4.5, 3.5, 2.7, 2.0, 1.6, 1.2, 0.9, 0.7, 0.6, 0.4, 0.3,
      0.3, 0.2, 0.1, 0.1,
    ],
  },
  {
    number: 49,
    description: "300 mm LW CMU w/fill insulation, gyp. board",
    printedU: 0.688,
    printedTotalR: 1.45,
    layers: ["F01", "M09", "F04", "G01", "F02"],
    factorsPct: [
      1.0, 1.1, 2.6, 5.0, 7.1, 8.3, 8.5, 8.3, 7.7, 7.0, 6.3, 5.6, 4.9, 4.3, 3.8, 3.3, 2.9, 2.5, 2.2, 1.9, 1.7,
      1.5, 1.3, 1.1,
    ],
  },
  {
    number: 50,
    description: "100 mm LW concrete, R-0.9 board insulation, gyp. board",
    printedU: 0.675,
    printedTotalR: 1.48,
    layers: ["F01", "M11", "I01", "F04", "G01", "F02"],
    factorsPct: [
      0.7, 10.4, 19.7, 18.1, 13.9, 10.2, 7.4, 5.4, 3.9, 2.8, 2.1, 1.5, 1.1, 0.8, 0.6, 0.4, 0.3, 0.2, 0.2, 0.1,
      0.1, 0.1, 0.0, 0.0,
    ],
  },
  {
    number: 51,
    description: "100 mm LW concrete, R-1.8 board insulation, gyp. board",
    printedU: 0.424,
    printedTotalR: 2.36,
    layers: ["F01", "M11", "I01", "I01", "F04", "G01", "F02"],
    factorsPct: [
      0.3, 7.1, 17.4, 18.1, 14.6, 11.1, 8.2, 6.1, 4.5, 3.3, 2.5, 1.8, 1.3, 1.0, 0.7, 0.5, 0.4, 0.3, 0.2, 0.2,
      0.1, 0.1, 0.1, 0.0,
    ],
  },
  {
    number: 52,
    description: "100 mm LW concrete, R-1.9 batt insulation, gyp. board",
    printedU: 0.417,
    printedTotalR: 2.4,
    layers: ["F01", "M11", "I04", "G01", "F02"],
    factorsPct: [
      0.4, 8.4, 18.2, 17.9, 14.2, 10.7, 7.9, 5.9, 4.3, 3.2, 2.4, 1.7, 1.3, 0.9, 0.7, 0.5, 0.4, 0.3, 0.2, 0.2,
      0.1, 0.1, 0.1, 0.0,
    ],
  },
  {
    number: 53,
    description: "100 mm LW concrete, R-3.9 batt insulation, gyp. board",
    printedU: 0.23,
    printedTotalR: 4.34,
    layers: ["F01", "M11", "I04", "I04", "G01", "F02"],
    factorsPct: [
      0.1, 3.8, 13.6, 17.5, 15.6, 12.3, 9.4, 7.0, 5.3, 3.9, 3.0, 2.2, 1.6, 1.2, 0.9, 0.7, 0.5, 0.4, 0.3, 0.2,
      0.2, 0.1, 0.1, 0.1,
    ],
  },
  {
    number: 54,
    description: "100 mm LW concrete, R-1.8 board insulation, 100 mm LW concrete",
    printedU: 0.435,
    printedTotalR: 2.3,
    layers: ["F01", "M11", "I02", "M11", "F02"],
    factorsPct: [
      0.7, 0.9, 2.8, 5.6, 7.7, 8.7, 8.9, 8.6, 8.0, 7.3, 6.5, 5.7, 5.0, 4.3, 3.7, 3.2, 2.7, 2.3, 1.9, 1.6, 1.4,
      1.1, 0.9, 0.8,
    ],
  },
  {
    number: 55,
    description: "100 mm LW concrete, R-3.5 board insulation, 100 mm LW concrete",
    printedU: 0.247,
    printedTotalR: 4.05,
    layers: ["F01", "M11", "I02", "I02", "M11", "F02"],
    factorsPct: [
      0.9, 0.8, 1.6, 3.7, 5.9, 7.4, 8.2, 8.3, 8.1, 7.6, 6.9, 6.3, 5.6, 4.9, 4.3, 3.7, 3.2, 2.8, 2.4, 2.0, 1.7,
      1.5, 1.2, 1.0,
    ],
  },
  {
    number: 56,
    description: "EIFS, R-0.9 insulation board, 200 mm LW concrete, gyp. board",
    printedU: 0.652,
    printedTotalR: 1.53,
    layers: ["F01", "F06", "I01", "M13", "G01", "F02"],
    factorsPct: [
      2.2, 2.2, 3.2, 4.6, 5.7, 6.2, 6.3, 6.2, 6.0, 5.7, 5.4, 5.1, 4.8, 4.5, 4.2, 3.9, 3.7, 3.5, 3.2, 3.0, 2.8,
      2.6, 2.5, 2.3,
    ],
  },
  {
    number: 57,
    description: "EIFS, R-1.8 insulation board, 200 mm LW concrete, gyp. board",
    printedU: 0.412,
    printedTotalR: 2.41,
    layers: ["F01", "F06", "I01", "I01", "M13", "G01", "F02"],
    factorsPct: [
      2.4, 2.4, 3.1, 4.2, 5.2, 5.7, 5.9, 5.9, 5.8, 5.6, 5.3, 5.1, 4.8, 4.6, 4.3, 4.1, 3.9, 3.6, 3.4, 3.3, 3.1,
      2.9, 2.7, 2.6,
    ],
  },
  {
    number: 58,
    description: "200 mm LW concrete, R-11 batt insulation, gyp. board",
    printedU: 0.068,
    printedTotalR: 14.7,
    printedUnits: "IP",
    layers: ["F01", "M13", "I04", "G01", "F02"],
    factorsPct: [
      1.4, 1.6, 3.2, 5.6, 7.2, 7.7, 7.7, 7.3, 6.8, 6.2, 5.6, 5.1, 4.7, 4.2, 3.8, 3.5, 3.2, 2.9, 2.6, 2.4, 2.1,
      1.9, 1.8, 1.6,
    ],
  },
  {
    number: 59,
    description: "200 mm LW concrete, R-22 batt insulation, gyp. board",
    printedU: 0.039,
    printedTotalR: 25.7,
    printedUnits: "IP",
    layers: ["F01", "M13", "I04", "I04", "G01", "F02"],
    factorsPct: [
      1.6, 1.6, 2.4, 4.3, 6.2, 7.2, 7.4, 7.3, 6.9, 6.4, 5.9, 5.4, 4.9, 4.5, 4.1, 3.7, 3.4, 3.1, 2.8, 2.6, 2.4,
      2.2, 2.0, 1.8,
    ],
  },
  {
    number: 60,
    description: "EIFS finish, R-1.8 insulation board, 200 mm HW concrete, gyp. board",
    printedU: 0.082,
    printedTotalR: 12.1,
    printedUnits: "IP",
    layers: ["F01", "F06", "I02", "M15", "G01", "F02"],
    factorsPct: [
      2.8, 3.0, 4.2, 5.2, 5.6, 5.6, 5.5, 5.3, 5.2, 5.0, 4.8, 4.6, 4.4, 4.3, 4.1, 3.9, 3.8, 3.6, 3.5, 3.4, 3.2,
      3.1, 3.0, 2.9,
    ],
  },
  {
    number: 61,
    description: "EIFS finish, R-3.5 insulation board, 200 mm HW concrete, gyp. board",
    printedU: 0.045,
    printedTotalR: 22.1,
    printedUnits: "IP",
    layers: ["F01", "F06", "I02", "I02", "M15", "G01", "F02"],
    factorsPct: [
      2.9, 2.9, 3.5, 4.5, 5.2, 5.5, 5.5, 5.4, 5.2, 5.0, 4.9, 4.7, 4.5, 4.4, 4.2, 4.1, 3.9, 3.8, 3.6, 3.5, 3.4,
      3.3, 3.1, 3.0,
    ],
  },
  {
    number: 62,
    description: "200 mm HW concrete, R-11 batt insulation, gyp. board",
    printedU: 0.076,
    printedTotalR: 13.1,
    printedUnits: "IP",
    layers: ["F01", "M15", "I04", "G01", "F02"],
    factorsPct: [
      1.1, 2.1, 5.5, 8.2, 8.9, 8.6, 7.9, 7.1, 6.4, 5.7, 5.1, 4.6, 4.1, 3.7, 3.3, 2.9, 2.6, 2.3, 2.1, 1.9, 1.7,
      1.5, 1.3, 1.2,
    ],
  },
  {
    number: 63,
    description: "200 mm HW concrete, R-22 batt insulation, gyp. board",
    printedU: 0.041,
    printedTotalR: 24.2,
    printedUnits: "IP",
    layers: ["F01", "M15", "I04", "I04", "G01", "F02"],
    factorsPct: [
      1.2, 1.5, 3.8, 6.9, 8.4, 8.6, 8.1, 7.4, 6.7, 6.1, 5.4, 4.9, 4.4, 3.9, 3.5, 3.2, 2.8, 2.5, 2.3, 2.0, 1.8,
      1.6, 1.5, 1.3,
    ],
  },
  {
    number: 64,
    description: "300 mm HW concrete, R-3.3 batt insulation, gyp. board",
    printedU: 0.047,
    printedTotalR: 21.4,
    printedUnits: "IP",
    layers: ["F01", "M16", "I05", "G01", "F02"],
    factorsPct: [
      2.5, 2.4, 2.7, 3.6, 4.7, 5.5, 5.9, 6.0, 5.9, 5.7, 5.5, 5.2, 5.0, 4.7, 4.4, 4.2, 4.0, 3.7, 3.5, 3.3, 3.1,
      3.0, 2.8, 2.6,
    ],
  },
  {
    number: 65,
    description: "300 mm HW concrete, R-6.7 batt insulation, gyp. board",
    printedU: 0.025,
    printedTotalR: 40.5,
    printedUnits: "IP",
    layers: ["F01", "M16", "I05", "I05", "G01", "F02"],
    factorsPct: [
      2.7, 2.6, 2.5, 2.8, 3.5, 4.3, 5.1, 5.5, 5.8, 5.8, 5.7, 5.5, 5.3, 5.1, 4.8, 4.6, 4.3, 4.1, 3.9, 3.6, 3.4,
      3.2, 3.1, 2.9,
    ],
  },
  {
    number: 66,
    description: "300 mm HW concrete",
    printedU: 0.549,
    printedTotalR: 1.8,
    printedUnits: "IP",
    layers: ["F01", "M16", "F02"],
    factorsPct: [
      1.2, 1.9, 4.3, 6.6, 7.8, 8.1, 7.9, 7.4, 6.8, 6.2, 5.6, 5.0, 4.5, 4.0, 3.6, 3.2, 2.9, 2.6, 2.3, 2.0, 1.8,
      1.6, 1.5, 1.3,
    ],
  },
];

/** HoF 2021 ch. 18 Table 17 "Roof Conduction Time Series (CTS)", roofs 1–37, as read (rows printed 1–24, read as hour 0–23). */
export const ROOF_CTS: readonly PrintedConstruction[] = [
  {
    number: 1,
    description: "Metal roof, R-3.3 batt insulation, gyp. board",
    printedU: 0.2485,
    printedTotalR: 4.02,
    layers: ["F01", "F08", "G03", "F05", "I05", "G01", "F03"],
    factorsPct: [
      6.4, 44.2, 32.7, 11.6, 3.6, 1.1, 0.3, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 2,
    description: "Metal roof, R-6.7 batt insulation, gyp. board",
    printedU: 0.1355,
    printedTotalR: 7.38,
    layers: ["F01", "F08", "G03", "F05", "I05", "I05", "G01", "F03"],
    factorsPct: [
      0.3, 10.9, 28.5, 25.9, 16.2, 8.9, 4.6, 2.3, 1.2, 0.6, 0.3, 0.1, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 3,
    description: "Metal roof, R-3.3 batt insulation, suspended acoustical ceiling",
    printedU: 0.2265,
    printedTotalR: 4.42,
    layers: ["F01", "F08", "G03", "F05", "I05", "F05", "F16", "F03"],
    factorsPct: [
      10.1, 55.6, 27.3, 5.7, 1.0, 0.2, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 4,
    description: "Metal roof, R-6.7 batt insulation, suspended acoustical ceiling",
    printedU: 0.1287,
    printedTotalR: 7.77,
    layers: ["F01", "F08", "G03", "F05", "I05", "I05", "F05", "F16", "F03"],
    factorsPct: [
      0.5, 14.8, 32.1, 24.3, 13.6, 7.1, 3.7, 1.9, 1.0, 0.5, 0.3, 0.1, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 5,
    description: "Metal roof, R-3.3 batt insulation",
    printedU: 0.2547,
    printedTotalR: 3.93,
    layers: ["F01", "F08", "G03", "F05", "I05", "F03"],
    factorsPct: [
      26.6, 61.0, 11.2, 1.1, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 6,
    description: "Metal roof, R-6.7 batt insulation",
    printedU: 0.0242,
    printedTotalR: 41.35,
    printedUnits: "IP",
    layers: ["F01", "F08", "G03", "F05", "I05", "I05", "F03"],
    factorsPct: [
      1.9, 27.5, 34.7, 19.1, 9.0, 4.2, 1.9, 0.9, 0.4, 0.2, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 7,
    description: "Asphalt shingles, wood sheathing, R-3.3 batt insulation, gyp. board",
    printedU: 0.2348,
    printedTotalR: 4.26,
    layers: ["F01", "F12", "G05", "F05", "I05", "F05", "G01", "F03"],
    factorsPct: [
      0.9, 16.5, 30.1, 23.5, 14.0, 7.5, 3.8, 1.9, 0.9, 0.5, 0.2, 0.1, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 8,
    description: "Asphalt shingles, wood sheathing, R-6.7 batt insulation, gyp. board",
    printedU: 0.1313,
    printedTotalR: 7.62,
    layers: ["F01", "F12", "G05", "F05", "I05", "I05", "F05", "G01", "F03"],
    factorsPct: [
      0.0, 2.6, 13.3, 21.0, 20.2, 15.5, 10.6, 6.7, 4.1, 2.5, 1.4, 0.8, 0.5, 0.3, 0.2, 0.1, 0.1, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 9,
    description: "Slate or tile, wood sheathing, R-3.3 batt insulation, gyp. board",
    printedU: 0.2388,
    printedTotalR: 4.19,
    layers: ["F01", "F14", "G05", "F05", "I05", "F05", "G01", "F03"],
    factorsPct: [
      0.8, 16.6, 32.8, 25.0, 13.6, 6.4, 2.8, 1.2, 0.5, 0.2, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 10,
    description: "Slate or tile, wood sheathing, R-6.7 batt insulation, gyp. board",
    printedU: 0.1325,
    printedTotalR: 7.54,
    layers: ["F01", "F14", "G05", "F05", "I05", "I05", "F05", "G01", "F03"],
    factorsPct: [
      0.0, 2.5, 14.0, 22.8, 21.4, 15.7, 10.1, 6.0, 3.4, 1.9, 1.0, 0.6, 0.3, 0.2, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 11,
    description: "Wood shingles, wood sheathing, R-3.3 batt insulation, gyp. board",
    printedU: 0.23,
    printedTotalR: 4.35,
    layers: ["F01", "F15", "G05", "F05", "I05", "F05", "G01", "F03"],
    factorsPct: [
      0.6, 11.6, 24.2, 22.1, 15.6, 10.0, 6.2, 3.8, 2.3, 1.4, 0.8, 0.5, 0.3, 0.2, 0.1, 0.1, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 12,
    description: "Wood shingles, wood sheathing, R-6.7 batt insulation, gyp. board",
    printedU: 0.1298,
    printedTotalR: 7.7,
    layers: ["F01", "F15", "G05", "F05", "I05", "I05", "F05", "G01", "F03"],
    factorsPct: [
      0.0, 1.7, 9.7, 17.0, 18.1, 15.5, 11.9, 8.5, 5.9, 4.0, 2.6, 1.7, 1.1, 0.7, 0.5, 0.3, 0.2, 0.1, 0.1, 0.1,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 13,
    description: "Membrane, sheathing, R-1.8 insulation board, wood deck",
    printedU: 0.3944,
    printedTotalR: 2.54,
    layers: ["F01", "F13", "G03", "I02", "G06", "F03"],
    factorsPct: [
      0.3, 6.9, 17.2, 17.7, 14.3, 10.9, 8.2, 6.2, 4.6, 3.5, 2.6, 2.0, 1.5, 1.1, 0.8, 0.6, 0.5, 0.3, 0.3, 0.2,
      0.1, 0.1, 0.1, 0.1,
    ],
  },
  {
    number: 14,
    description: "Membrane, sheathing, R-3.5 insulation board, wood deck",
    printedU: 0.2333,
    printedTotalR: 4.29,
    layers: ["F01", "F13", "G03", "I02", "I02", "G06", "F03"],
    factorsPct: [
      0.1, 2.1, 10.0, 15.4, 15.2, 12.7, 10.1, 7.9, 6.1, 4.7, 3.6, 2.8, 2.2, 1.7, 1.3, 1.0, 0.8, 0.6, 0.5, 0.4,
      0.3, 0.2, 0.2, 0.1,
    ],
  },
  {
    number: 15,
    description: "Membrane, sheathing, R-1.8 insulation board, wood deck, suspended acoustical ceiling",
    printedU: 0.3306,
    printedTotalR: 3.02,
    layers: ["F01", "F13", "G03", "I02", "G06", "F05", "F16", "F03"],
    factorsPct: [
      0.9, 2.7, 7.8, 10.1, 9.8, 8.8, 7.8, 6.9, 6.1, 5.4, 4.8, 4.2, 3.7, 3.3, 2.9, 2.6, 2.3, 2.0, 1.8, 1.5,
      1.4, 1.2, 1.1, 0.9,
    ],
  },
  {
    number: 16,
    description: "Membrane, sheathing, R-3.5 insulation board, wood deck, suspended acoustical ceiling",
    printedU: 0.2094,
    printedTotalR: 4.78,
    layers: ["F01", "F13", "G03", "I02", "I02", "G06", "F05", "F16", "F03"],
    factorsPct: [
      1.2, 1.5, 4.3, 7.6, 8.8, 8.6, 8.0, 7.2, 6.5, 5.9, 5.3, 4.7, 4.3, 3.8, 3.4, 3.1, 2.8, 2.5, 2.2, 2.0, 1.8,
      1.6, 1.5, 1.3,
    ],
  },
  {
    number: 17,
    description: "Membrane, sheathing, R-1.8 insulation board, metal deck",
    printedU: 0.4539,
    printedTotalR: 2.2,
    layers: ["F01", "F13", "G03", "I02", "F08", "F03"],
    factorsPct: [
      18.0, 60.0, 18.4, 3.0, 0.5, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 18,
    description: "Membrane, sheathing, R-3.5 insulation board, metal deck",
    printedU: 0.2528,
    printedTotalR: 3.96,
    layers: ["F01", "F13", "G03", "I02", "I02", "F08", "F03"],
    factorsPct: [
      3.3, 38.1, 37.6, 14.6, 4.5, 1.3, 0.4, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 19,
    description: "Membrane, sheathing, R-1.8 insulation board, metal deck, suspended acoustical ceiling",
    printedU: 0.3714,
    printedTotalR: 2.69,
    layers: ["F01", "F13", "G03", "I02", "F08", "F05", "F16", "F03"],
    factorsPct: [
      4.8, 40.0, 34.7, 13.8, 4.6, 1.4, 0.4, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 20,
    description: "Membrane, sheathing, R-3.5 insulation board, metal deck, suspended acoustical ceiling",
    printedU: 0.188,
    printedTotalR: 5.32,
    layers: ["F01", "F13", "G03", "I02", "I02", "F08", "F05", "F16", "F03"],
    factorsPct: [
      0.2, 8.8, 26.6, 26.3, 17.3, 9.8, 5.2, 2.7, 1.4, 0.7, 0.4, 0.2, 0.1, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 21,
    description: "Membrane, sheathing, R-2.6 insulation board, metal deck",
    printedU: 0.3248,
    printedTotalR: 3.08,
    layers: ["F01", "F13", "G03", "I03", "F08", "F03"],
    factorsPct: [
      8.6, 52.5, 29.8, 7.3, 1.5, 0.3, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 22,
    description: "Membrane, sheathing, R-5.3 insulation board, metal deck",
    printedU: 0.1752,
    printedTotalR: 5.71,
    layers: ["F01", "F13", "G03", "I03", "I03", "F08", "F03"],
    factorsPct: [
      0.3, 12.8, 31.1, 25.5, 14.7, 7.7, 3.9, 2.0, 1.0, 0.5, 0.2, 0.1, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 23,
    description: "Membrane, sheathing, R-4.4 insulation board, metal deck",
    printedU: 0.2485,
    printedTotalR: 4.02,
    layers: ["F01", "F08", "G03", "F05", "I05", "G01", "F03"],
    factorsPct: [
      6.4, 44.2, 32.7, 11.6, 3.6, 1.1, 0.3, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
      0.0, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 24,
    description: "50 mm concrete roof ballast, membrane, sheathing, R-2.6 insulation board, metal deck",
    printedU: 0.2984,
    printedTotalR: 3.35,
    layers: ["F01", "M17", "F13", "G03", "I03", "F08", "F03"],
    factorsPct: [
      0.4, 10.1, 21.9, 19.5, 14.2, 10.1, 7.1, 5.0, 3.5, 2.5, 1.7, 1.2, 0.9, 0.6, 0.4, 0.3, 0.2, 0.2, 0.1, 0.1,
      0.1, 0.0, 0.0, 0.0,
    ],
  },
  {
    number: 25,
    description: "50 mm concrete roof ballast, membrane, sheathing, R-5.3 insulation board, metal deck",
    printedU: 0.1673,
    printedTotalR: 5.98,
    layers: ["F01", "M17", "F13", "G03", "I03", "I03", "F08", "F03"],
    factorsPct: [
      0.1, 1.3, 8.1, 14.7, 15.8, 14.0, 11.4, 8.8, 6.7, 5.0, 3.7, 2.8, 2.0, 1.5, 1.1, 0.8, 0.6, 0.4, 0.3, 0.2,
      0.2, 0.1, 0.1, 0.1,
    ],
  },
  {
    number: 26,
    description: "Membrane, sheathing, R-2.6 insulation board, 100 mm LW concrete",
    printedU: 0.3059,
    printedTotalR: 3.27,
    layers: ["F01", "F13", "G03", "I03", "M11", "F03"],
    factorsPct: [
      0.6, 2.2, 7.9, 11.2, 11.2, 10.0, 8.7, 7.5, 6.4, 5.5, 4.7, 4.0, 3.4, 2.9, 2.5, 2.2, 1.8, 1.6, 1.4, 1.2,
      1.0, 0.9, 0.7, 0.6,
    ],
  },
  {
    number: 27,
    description: "Membrane, sheathing, R-5.3 insulation board, 100 mm LW concrete",
    printedU: 0.1696,
    printedTotalR: 5.9,
    layers: ["F01", "F13", "G03", "I03", "I03", "M11", "F03"],
    factorsPct: [
      0.8, 0.9, 2.5, 5.9, 8.6, 9.6, 9.4, 8.7, 7.8, 6.9, 6.0, 5.2, 4.5, 3.9, 3.4, 2.9, 2.5, 2.2, 1.9, 1.6, 1.4,
      1.2, 1.1, 0.9,
    ],
  },
  {
    number: 28,
    description: "Membrane, sheathing, R-2.6 insulation board, 150 mm LW concrete",
    printedU: 0.2972,
    printedTotalR: 3.36,
    layers: ["F01", "F13", "G03", "I03", "M12", "F03"],
    factorsPct: [
      1.5, 1.7, 3.4, 6.0, 7.5, 7.8, 7.6, 7.1, 6.5, 6.0, 5.5, 5.0, 4.6, 4.2, 3.8, 3.5, 3.2, 2.9, 2.6, 2.4, 2.2,
      2.0, 1.8, 1.7,
    ],
  },
  {
    number: 29,
    description: "Membrane, sheathing, R-5.3 insulation board, 150 mm LW concrete",
    printedU: 0.1669,
    printedTotalR: 5.99,
    layers: ["F01", "F13", "G03", "I03", "I03", "M12", "F03"],
    factorsPct: [
      1.9, 1.7, 2.0, 3.2, 4.9, 6.2, 6.9, 7.0, 6.9, 6.5, 6.1, 5.7, 5.2, 4.8, 4.4, 4.1, 3.7, 3.4, 3.1, 2.9, 2.6,
      2.4, 2.2, 2.0,
    ],
  },
  {
    number: 30,
    description: "Membrane, sheathing, R-2.6 insulation board, 200 mm LW concrete",
    printedU: 0.289,
    printedTotalR: 3.46,
    layers: ["F01", "F13", "G03", "I03", "M13", "F03"],
    factorsPct: [
      2.4, 2.3, 2.6, 3.7, 4.9, 5.7, 6.1, 6.1, 6.0, 5.8, 5.5, 5.2, 5.0, 4.7, 4.4, 4.1, 3.9, 3.7, 3.4, 3.2, 3.0,
      2.9, 2.7, 2.5,
    ],
  },
  {
    number: 31,
    description: "Membrane, sheathing, R-5.3 insulation board, 200 mm LW concrete",
    printedU: 0.1688,
    printedTotalR: 5.92,
    layers: ["F01", "F13", "G03", "I03", "I03", "M13", "F03"],
    factorsPct: [
      1.5, 1.4, 1.5, 2.6, 4.6, 6.4, 7.4, 7.8, 7.6, 7.2, 6.7, 6.1, 5.5, 5.0, 4.5, 4.0, 3.6, 3.2, 2.9, 2.6, 2.3,
      2.1, 1.9, 1.7,
    ],
  },
  {
    number: 32,
    description: "Membrane, sheathing, R-2.6 insulation board, 150 mm HW concrete",
    printedU: 0.3167,
    printedTotalR: 3.16,
    layers: ["F01", "F13", "G03", "I03", "M14", "F03"],
    factorsPct: [
      2.0, 2.4, 4.6, 6.5, 7.0, 6.8, 6.5, 6.1, 5.7, 5.3, 5.0, 4.7, 4.4, 4.1, 3.8, 3.6, 3.4, 3.1, 2.9, 2.8, 2.6,
      2.4, 2.3, 2.1,
    ],
  },
  {
    number: 33,
    description: "Membrane, sheathing, R-5.3 insulation board, 150 mm HW concrete",
    printedU: 0.1729,
    printedTotalR: 5.79,
    layers: ["F01", "F13", "G03", "I03", "I03", "M14", "F03"],
    factorsPct: [
      2.3, 2.2, 2.7, 4.1, 5.4, 6.2, 6.4, 6.3, 6.1, 5.8, 5.5, 5.2, 4.8, 4.5, 4.3, 4.0, 3.8, 3.5, 3.3, 3.1, 2.9,
      2.7, 2.6, 2.4,
    ],
  },
  {
    number: 34,
    description: "Membrane, sheathing, R-2.6 insulation board, 200 mm HW concrete",
    printedU: 0.3139,
    printedTotalR: 3.19,
    layers: ["F01", "F13", "G03", "I03", "M15", "F03"],
    factorsPct: [
      2.6, 2.6, 3.5, 4.8, 5.7, 5.9, 5.9, 5.7, 5.5, 5.3, 5.0, 4.8, 4.6, 4.4, 4.2, 4.0, 3.8, 3.6, 3.4, 3.3, 3.1,
      3.0, 2.8, 2.7,
    ],
  },
  {
    number: 35,
    description: "Membrane, sheathing, R-5.3 insulation board, 200 mm HW concrete",
    printedU: 0.1719,
    printedTotalR: 5.82,
    layers: ["F01", "F13", "G03", "I03", "I03", "M15", "F03"],
    factorsPct: [
      2.8, 2.7, 2.8, 3.4, 4.3, 5.0, 5.5, 5.6, 5.6, 5.5, 5.3, 5.1, 4.9, 4.7, 4.5, 4.3, 4.1, 3.9, 3.7, 3.6, 3.4,
      3.2, 3.1, 3.0,
    ],
  },
  {
    number: 36,
    description: "Membrane, 150 mm HW concrete, R-3.3 batt insulation, suspended acoustical ceiling",
    printedU: 0.2387,
    printedTotalR: 4.19,
    layers: ["F01", "F13", "M14", "F05", "I05", "F16", "F03"],
    factorsPct: [
      1.4, 2.3, 5.7, 8.0, 8.2, 7.8, 7.2, 6.6, 6.0, 5.5, 5.0, 4.6, 4.2, 3.8, 3.5, 3.2, 2.9, 2.6, 2.4, 2.2, 2.0,
      1.8, 1.7, 1.5,
    ],
  },
  {
    number: 37,
    description: "Membrane, 150 mm HW concrete, R-6.7 batt insulation, suspended acoustical ceiling",
    printedU: 0.1325,
    printedTotalR: 7.54,
    layers: ["F01", "F13", "M14", "F05", "I05", "I05", "F16", "F03"],
    factorsPct: [
      1.6, 1.6, 2.6, 4.8, 6.5, 7.3, 7.4, 7.1, 6.7, 6.2, 5.7, 5.3, 4.8, 4.4, 4.0, 3.7, 3.4, 3.1, 2.8, 2.6, 2.4,
      2.2, 2.0, 1.8,
    ],
  },
];

// ---------------------------------------------------------------------------------------------
// Our base assemblies → the nearest printed construction.

export type CtsSource =
  { kind: "printed"; table: 16 | 17; number: number; reason: string } | { kind: "steady"; reason: string };

const STEADY_BUFFER_REASON =
  "Faces a buffer space (vented attic, crawlspace, garage or basement), not sol-air: HoF 2021 ch. 18 §6.5 " +
  "gives q = U·A·(t_b − t_i) (eq. 32) with no time series, and the engine supplies t_b hour by hour. " +
  "The series is [1, 0, …, 0].";

/**
 * Nearest printed construction by layers (outdoors to indoors) and mass, per base assembly of
 * lib/load/input.ts. Masses from Table 18 (kg/m², layers summed). Framing is absent from every
 * printed stud wall and roof (ch. 18 §6.4 points to an equivalent-wall procedure for thermal
 * bridges, not done here); it changes the U-factor, which comes from assemblies.ts, more than the
 * time response.
 */
export const BASE_ASSEMBLY_CTS: Readonly<Record<BaseAssembly, CtsSource>> = {
  "wood-2x4-16in-oc": {
    kind: "printed",
    table: 16,
    number: 11,
    reason:
      "Wall 11: wood siding, 16 mm plywood sheathing, 89 mm batt (R 1.94), 16 mm gypsum, about 30 kg/m²: our siding, " +
      "sheathing, 3½ in cavity batt and ½ in gypsum in the same order. Our vinyl siding is lighter than the printed " +
      "wood siding, so the printed series lags a little more than ours would.",
  },
  "wood-2x4-24in-oc": {
    kind: "printed",
    table: 16,
    number: 11,
    reason: "Wall 11, as for 2x4 at 16 in: the wider stud spacing changes the U-factor, not the layers.",
  },
  "wood-2x6-16in-oc": {
    kind: "printed",
    table: 16,
    number: 12,
    reason:
      "Wall 12: wall 11's layers with two 89 mm batts (178 mm, R 3.88), nearest to a 5½ in cavity with R-19 to R-21 " +
      "batts (R 3.3–3.7 m²·K/W); more insulation between the same light layers slows the response (ch. 18 Fig. 10).",
  },
  "wood-2x6-24in-oc": {
    kind: "printed",
    table: 16,
    number: 12,
    reason: "Wall 12, as for 2x6 at 16 in.",
  },
  "cmu-8in-hollow": {
    kind: "printed",
    table: 16,
    number: 45,
    reason:
      "Wall 45: 25 mm stucco, 200 mm normal-weight concrete block (M05, 163 kg/m²), 89 mm batt, 16 mm gypsum, about " +
      "225 kg/m²: our ⅞ in stucco, 8 in hollow normal-weight block, furred cavity and ½ in gypsum in the same order. " +
      "The printed batt is deeper than our 1½ in furring.",
  },
  "cmu-8in-core-filled": {
    kind: "printed",
    table: 16,
    number: 45,
    reason:
      "Wall 45, as for the hollow block: no printed wall uses the filled normal-weight block (M10: same mass as M05, " +
      "R 0.28 against 0.18). The walls with filled block (43, 44, 47, 48) use lightweight block (M08, 94 kg/m²), " +
      "about 60 % of the mass, so the mass decides for wall 45.",
  },
  "attic-joists-24in-oc": { kind: "steady", reason: STEADY_BUFFER_REASON },
  "attic-joists-16in-oc": { kind: "steady", reason: STEADY_BUFFER_REASON },
  "roof-rafters-2x8-24in-oc": {
    kind: "printed",
    table: 17,
    number: 7,
    reason:
      "Roof 7: asphalt shingles, 25 mm wood sheathing, air space, 154 mm batt (R 3.34), air space, 16 mm gypsum, about " +
      "35 kg/m²: our shingles, deck, 7¼ in cavity batt and gypsum of a vaulted ceiling. Used as a vaulted ceiling (the " +
      "room below the deck); over an encapsulated attic the room does not face the deck.",
  },
  "roof-rafters-2x10-24in-oc": {
    kind: "printed",
    table: 17,
    number: 8,
    reason:
      "Roof 8: roof 7 with two 154 mm batts (R 6.68). A 9¼ in cavity with R-30 to R-38 (R 5.3–6.7 m²·K/W) is nearer " +
      "roof 8's insulation than roof 7's; roof 7 would be the faster (higher-peak) choice.",
  },
  "roof-rafters-2x12-24in-oc": {
    kind: "printed",
    table: 17,
    number: 8,
    reason: "Roof 8: an 11¼ in cavity with R-38 or more matches its 309 mm of batt.",
  },
  "floor-joists-2x10-16in-oc": { kind: "steady", reason: STEADY_BUFFER_REASON },
  "floor-joists-2x10-24in-oc": { kind: "steady", reason: STEADY_BUFFER_REASON },
};

/** A printed construction's factors as a series summing to 1 (printed % divided by their own total). */
export function printedConductionTimeSeries(table: 16 | 17, number: number): Float64Array {
  const list = table === 16 ? WALL_CTS : table === 17 ? ROOF_CTS : undefined;
  if (!list) throw new LoadInputError("cts.table", `must be 16 (walls) or 17 (roofs), got ${String(table)}`);
  const found = list.find((c) => c.number === number);
  if (!found) {
    throw new LoadInputError(
      "cts.number",
      `Table ${table} has constructions 1 to ${list.length}, got ${String(number)}`,
      {
        min: 1,
        max: list.length,
      },
    );
  }
  let total = 0;
  for (const f of found.factorsPct) total += f;
  const series = new Float64Array(HOURS_PER_DAY);
  for (let j = 0; j < HOURS_PER_DAY; j++) series[j] = found.factorsPct[j] / total;
  return series;
}

/**
 * The CTS for one of our base assemblies (24 factors, index 0 = the current hour, summing to 1):
 * the nearest printed construction of BASE_ASSEMBLY_CTS, or [1, 0, …, 0] for surfaces that face a
 * buffer space. Allocates a new array: call it once per plan.
 */
export function conductionTimeSeries(baseAssemblyId: BaseAssembly): Float64Array {
  const source = Object.prototype.hasOwnProperty.call(BASE_ASSEMBLY_CTS, baseAssemblyId)
    ? BASE_ASSEMBLY_CTS[baseAssemblyId]
    : undefined;
  if (!source) {
    throw new LoadInputError(
      "baseAssemblyId",
      `must be one of ${Object.keys(BASE_ASSEMBLY_CTS).join(", ")}, got ${String(baseAssemblyId)}`,
    );
  }
  if (source.kind === "steady") {
    const series = new Float64Array(HOURS_PER_DAY);
    series[0] = 1;
    return series;
  }
  return printedConductionTimeSeries(source.table, source.number);
}

/**
 * Hourly conduction heat gain through a wall or roof, Btu/h (HoF 2021 ch. 18 eq. 30–31):
 *   out[h] = U·A·Σ_j c_j·(t_e[(h − j) mod 24] − t_rc)
 * from a 24-hour sol-air profile t_e (°F, ch. 18 eq. 29; lib/load/attic.ts solAirTemperatureF) and
 * the constant room temperature t_rc (°F). Writes into `out` and returns it; allocates nothing.
 * `out` must not alias `solAirF`.
 */
export function conductionHeatGainBtuh(
  uBtuPerHrFt2F: number,
  areaFt2: number,
  solAirF: ArrayLike<number>,
  roomF: number,
  cts: ArrayLike<number>,
  out: Float64Array,
): Float64Array {
  if (typeof uBtuPerHrFt2F !== "number" || !Number.isFinite(uBtuPerHrFt2F) || uBtuPerHrFt2F < 0) {
    throw new LoadInputError(
      "uBtuPerHrFt2F",
      `must be a U-factor of 0 or more, got ${String(uBtuPerHrFt2F)}`,
      { min: 0, unit: "Btu/h·ft²·°F" },
    );
  }
  if (typeof areaFt2 !== "number" || !Number.isFinite(areaFt2) || areaFt2 < 0) {
    throw new LoadInputError("areaFt2", `must be an area of 0 or more, got ${String(areaFt2)}`, {
      min: 0,
      unit: "ft²",
    });
  }
  if (typeof roomF !== "number" || !Number.isFinite(roomF)) {
    throw new LoadInputError("roomF", `must be a finite temperature, got ${String(roomF)}`, { unit: "°F" });
  }
  if (solAirF.length !== HOURS_PER_DAY) {
    throw new LoadInputError("solAirF", `must hold ${HOURS_PER_DAY} hourly values, got ${solAirF.length}`, {
      min: HOURS_PER_DAY,
      max: HOURS_PER_DAY,
    });
  }
  for (let i = 0; i < HOURS_PER_DAY; i++) {
    if (!Number.isFinite(solAirF[i]))
      throw new LoadInputError(`solAirF[${i}]`, `must be a finite temperature, got ${String(solAirF[i])}`, {
        unit: "°F",
      });
  }
  const last = checkSeries("cts", cts);
  if (!(out instanceof Float64Array) || out.length !== HOURS_PER_DAY) {
    throw new LoadInputError("out", `must be a Float64Array of ${HOURS_PER_DAY} hours`, {
      min: HOURS_PER_DAY,
      max: HOURS_PER_DAY,
    });
  }
  if (
    (out as ArrayLike<number>) === solAirF ||
    (ArrayBuffer.isView(solAirF) && solAirF.buffer === out.buffer)
  ) {
    throw new LoadInputError("out", "must not share memory with solAirF (the sum reads every hour)");
  }
  // Σ_j c_j·(t_e − t_rc) = Σ_j c_j·t_e − t_rc·Σ_j c_j: one convolution, then the room term.
  let ctsSum = 0;
  for (let j = 0; j <= last; j++) ctsSum += cts[j];
  convolveDay(solAirF, cts, last, out);
  const ua = uBtuPerHrFt2F * areaFt2;
  const roomTerm = roomF * ctsSum;
  for (let h = 0; h < HOURS_PER_DAY; h++) out[h] = ua * (out[h] - roomTerm);
  return out;
}
