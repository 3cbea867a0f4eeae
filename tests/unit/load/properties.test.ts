/** Properties the engine must hold (the method notes, lib/load/README.md). */
import { describe, expect, it } from "vitest";
import {
  COOLING_LATENT_COMPONENTS,
  COOLING_SENSIBLE_COMPONENTS,
  computeFacingLoads,
  computePlanFacings,
  ENGINE_VERSION,
  HEATING_COMPONENTS,
  LOAD_PROCEDURES,
  parsePlanInput,
  parseSiteConditions,
  type PlanInputRaw,
} from "../../../lib/load";
import { ASPEN_1, BIRCH_2, CEDAR_BEND_SITE, CYPRESS_3 } from "../../fixtures/engine/example-plans";
import { SEA_LEVEL_SITE, symmetricPlan } from "./helpers";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(1, Math.abs(b));

describe.each(LOAD_PROCEDURES.map((procedure) => [procedure] as const))(
  "load engine properties (%s)",
  (procedure) => {
    const opts = { procedure };
    it("heating load does not depend on facing", () => {
      const loads = [0, 37, 90, 181, 275.5].map(
        (az) => computeFacingLoads(ASPEN_1, CEDAR_BEND_SITE, az, opts).heating.totalBtuh,
      );
      for (const l of loads) expect(l).toBe(loads[0]);
    });

    it("a house with the same glazing on every facade has the same cooling load at every facing", () => {
      const result = computePlanFacings(symmetricPlan(), SEA_LEVEL_SITE, opts);
      const totals = result.facings.map((f) => f.cooling.totalBtuh);
      for (const t of totals) expect(rel(t, totals[0])).toBeLessThan(1e-9);
      expect(result.coolingSpreadBtuh).toBeLessThan(1e-6 * totals[0]);
    });

    it("glass on the front only: heating the same at every facing; cooling highest with the front west and lowest with it north", () => {
      // Physics (32° N, July): west glass takes the afternoon sun when the outdoor air is near its daily
      // peak; east glass gets as much sun but in the cool morning (and, in the hourly method, stored heat
      // from it has mostly left by the afternoon peak); south glass sees a high summer sun at steep
      // incidence; north glass sees mostly diffuse sky. So front-west > front-east and front-north is lowest.
      const opaque = { grossWallAreaFt2: 400 };
      const plan = symmetricPlan({
        facades: {
          front: { grossWallAreaFt2: 400, window: { areaFt2: 80, uFactor: 0.3, shgc: 0.3 } },
          left: opaque,
          back: opaque,
          right: opaque,
        },
      });
      const result = computePlanFacings(plan, SEA_LEVEL_SITE, opts);
      const byLabel = Object.fromEntries(result.facings.map((f) => [f.label, f]));
      const heating = result.facings.map((f) => f.heating.totalBtuh);
      for (const h of heating) expect(rel(h, heating[0])).toBeLessThan(1e-9);
      const cooling = (label: string) => byLabel[label].cooling.totalBtuh;
      expect(cooling("W")).toBeGreaterThan(cooling("E"));
      expect(Math.min(cooling("E"), cooling("S"), cooling("W"))).toBeGreaterThan(cooling("N"));
      expect(result.worst.label).toBe("W");
    });

    it("turning a lot by 360° is no change", () => {
      for (const az of [0, 45, 123.4]) {
        const a = computeFacingLoads(BIRCH_2, CEDAR_BEND_SITE, az, opts);
        const b = computeFacingLoads(BIRCH_2, CEDAR_BEND_SITE, az + 360, opts);
        const c = computeFacingLoads(BIRCH_2, CEDAR_BEND_SITE, az - 720, opts);
        expect(b.cooling.totalBtuh).toBeCloseTo(a.cooling.totalBtuh, 6);
        expect(c.cooling.hourlySensibleBtuh).toEqual(a.cooling.hourlySensibleBtuh);
        expect(b.heating.totalBtuh).toBe(a.heating.totalBtuh);
      }
    });

    it.each([
      ["Aspen", ASPEN_1],
      ["Birch", BIRCH_2],
      ["Cypress", CYPRESS_3],
    ] as const)("component loads add up to the totals (%s)", (_name, plan) => {
      for (const az of [0, 90, 200]) {
        const r = computeFacingLoads(plan, CEDAR_BEND_SITE, az, opts);
        const heatSum = HEATING_COMPONENTS.reduce((s, c) => s + r.heating.byComponent[c], 0);
        expect(rel(heatSum, r.heating.totalBtuh)).toBeLessThan(1e-12);
        const sensSum = COOLING_SENSIBLE_COMPONENTS.reduce((s, c) => s + r.cooling.sensibleByComponent[c], 0);
        expect(rel(sensSum, r.cooling.sensibleBtuh)).toBeLessThan(1e-12);
        const latSum = COOLING_LATENT_COMPONENTS.reduce((s, c) => s + r.cooling.latentByComponent[c], 0);
        expect(rel(latSum, r.cooling.latentBtuh)).toBeLessThan(1e-12);
        expect(r.cooling.totalBtuh).toBeCloseTo(r.cooling.sensibleBtuh + r.cooling.latentBtuh, 6);
        // The governing hour is the peak of the 24-hour fixed-set-point profile; the sensible load there is
        // lower by the temperature-swing credit (and the duct gain on it), never higher.
        const profile = r.cooling.hourlySensibleBtuh;
        if (procedure === "residential-load-factor") {
          // A peak-only procedure: no profile and no peak hour (HoF 2021 ch. 17 gives the peak load only).
          expect(profile).toHaveLength(0);
          expect(r.cooling.peakHour).toBeNull();
          continue;
        }
        expect(profile).toHaveLength(24);
        expect(profile[(r.cooling.peakHour ?? 0) - 1]).toBeCloseTo(Math.max(...profile), 6);
        expect(r.cooling.sensibleByComponent.temperatureSwing).toBeLessThanOrEqual(0);
        expect(r.cooling.sensibleBtuh).toBeLessThanOrEqual(Math.max(...profile) + 1e-6);
      }
    });

    it("more west glass raises the peak cooling load more than the same glass facing north", () => {
      // Front facing north (azimuth 0): front = N, left = E, back = S, right = W.
      const base = symmetricPlan();
      const add = (facade: "front" | "right"): PlanInputRaw => ({
        ...base,
        facades: {
          ...base.facades,
          [facade]: { grossWallAreaFt2: 400, window: { areaFt2: 100, uFactor: 0.3, shgc: 0.3 } },
        },
      });
      const baseLoad = computeFacingLoads(base, SEA_LEVEL_SITE, 0, opts).cooling.totalBtuh;
      const moreNorth =
        computeFacingLoads(add("front"), SEA_LEVEL_SITE, 0, opts).cooling.totalBtuh - baseLoad;
      const moreWest = computeFacingLoads(add("right"), SEA_LEVEL_SITE, 0, opts).cooling.totalBtuh - baseLoad;
      expect(moreNorth).toBeGreaterThan(0);
      expect(moreWest).toBeGreaterThan(1.5 * moreNorth);
    });

    it("raising ACH50 from 3 to 7 raises both loads", () => {
      const tight = computeFacingLoads(
        symmetricPlan({ infiltration: { ach50: 3 } }),
        SEA_LEVEL_SITE,
        0,
        opts,
      );
      const leaky = computeFacingLoads(
        symmetricPlan({ infiltration: { ach50: 7 } }),
        SEA_LEVEL_SITE,
        0,
        opts,
      );
      expect(leaky.heating.totalBtuh).toBeGreaterThan(tight.heating.totalBtuh);
      expect(leaky.cooling.totalBtuh).toBeGreaterThan(tight.cooling.totalBtuh);
      expect(leaky.cooling.latentBtuh).toBeGreaterThan(tight.cooling.latentBtuh);
    });

    it("an encapsulated attic with the ducts in it gives a lower load than a vented attic with the ducts in it, same insulation", () => {
      const vented = symmetricPlan({
        attic: { kind: "vented", ceiling: { cavityR: 30 } },
        ducts: { location: "vented-attic", insulationR: 8 },
      });
      const encapsulated = symmetricPlan({
        attic: {
          kind: "encapsulated",
          ceiling: { cavityR: 0 },
          roofDeck: { baseId: "roof-rafters-2x10-24in-oc", cavityR: 30 },
        },
        ducts: { location: "encapsulated-attic", insulationR: 8 },
      });
      const v = computeFacingLoads(vented, SEA_LEVEL_SITE, 180, opts);
      const e = computeFacingLoads(encapsulated, SEA_LEVEL_SITE, 180, opts);
      expect(e.cooling.totalBtuh).toBeLessThan(v.cooling.totalBtuh);
      expect(e.heating.totalBtuh).toBeLessThan(v.heating.totalBtuh);
    });

    it("an efficient house of today comes out well above 500 ft² per ton (common practice)", () => {
      for (const f of computePlanFacings(ASPEN_1, CEDAR_BEND_SITE, opts).facings) {
        expect(f.cooling.floorAreaPerTonFt2).toBeGreaterThan(600);
      }
    });

    it("results carry the engine version, the caution and derived figures consistent with their definitions", () => {
      const plan = computePlanFacings(ASPEN_1, CEDAR_BEND_SITE, opts);
      expect(plan.engineVersion).toBe(ENGINE_VERSION);
      expect(plan.facings.map((f) => [f.label, f.facingAzimuthDeg])).toEqual([
        ["N", 0],
        ["E", 90],
        ["S", 180],
        ["W", 270],
      ]);
      const totals = plan.facings.map((f) => f.cooling.totalBtuh);
      expect(plan.worst.coolingTotalBtuh).toBe(Math.max(...totals));
      expect(plan.coolingSpreadBtuh).toBeCloseTo(Math.max(...totals) - Math.min(...totals), 6);
      for (const f of plan.facings) {
        expect(f.caution).toMatch(/Design estimate/);
        expect(f.engineVersion).toBe(ENGINE_VERSION);
        expect(f.cooling.tons).toBeCloseTo(f.cooling.totalBtuh / 12_000, 9);
        expect(f.cooling.sensibleHeatRatio).toBeGreaterThan(0.5);
        expect(f.cooling.sensibleHeatRatio).toBeLessThanOrEqual(1);
        // Airflow = sensible / (1.10 × P/P0 × ΔT_supply); at 900 ft P/P0 ≈ 0.968 (standard atmosphere).
        expect(f.cooling.airflowCfm * 1.1 * 20).toBeGreaterThan(f.cooling.sensibleBtuh);
        expect(f.cooling.airflowCfm * 1.1 * 20 * 0.95).toBeLessThan(f.cooling.sensibleBtuh);
      }
    });

    it("already-parsed input may skip re-validation and gives the same answer", () => {
      const plan = parsePlanInput(ASPEN_1);
      const site = parseSiteConditions(CEDAR_BEND_SITE);
      const checked = computeFacingLoads(ASPEN_1, CEDAR_BEND_SITE, 45, opts);
      const trusted = computeFacingLoads(plan, site, 45, { validated: true, procedure });
      expect(trusted.cooling.totalBtuh).toBe(checked.cooling.totalBtuh);
      expect(trusted.heating.totalBtuh).toBe(checked.heating.totalBtuh);
      expect(computePlanFacings(plan, site, { validated: true, procedure }).worst).toEqual(
        computePlanFacings(ASPEN_1, CEDAR_BEND_SITE, opts).worst,
      );
    });
  },
);
