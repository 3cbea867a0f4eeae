/** Bad input: each case is refused with a LoadInputError naming the field (and range where one exists). */
import { describe, expect, it } from "vitest";
import {
  computeFacingLoads,
  LoadInputError,
  parsePlanInput,
  parseSiteConditions,
  safeParsePlanInput,
} from "../../../lib/load";
import { errorOf, SEA_LEVEL_SITE, symmetricPlan } from "./helpers";

const base = symmetricPlan();
const withFront = (front: Record<string, unknown>) => ({ ...base, facades: { ...base.facades, front } });

describe("bad plan input", () => {
  it("negative area names the field and its valid range", () => {
    const e = errorOf(() => parsePlanInput(withFront({ grossWallAreaFt2: -10 })));
    expect(e.field).toBe("facades.front.grossWallAreaFt2");
    expect(e.range).toMatchObject({ min: 0, unit: "ft²" });
    expect(e.message).toMatch(/out of range/);
  });

  it("missing area says it is required", () => {
    const e = errorOf(() => parsePlanInput(withFront({ window: { areaFt2: 10 } })));
    expect(e.field).toBe("facades.front.grossWallAreaFt2");
    expect(e.message).toMatch(/required/);
  });

  it("missing floor area says it is required", () => {
    const { conditionedFloorAreaFt2: _omit, ...rest } = base;
    const e = errorOf(() => parsePlanInput(rest));
    expect(e.field).toBe("conditionedFloorAreaFt2");
    expect(e.message).toMatch(/required/);
    expect(e.range).toMatchObject({ min: 100, max: 50_000 });
  });

  it("window area larger than its wall", () => {
    const e = errorOf(() => parsePlanInput(withFront({ grossWallAreaFt2: 100, window: { areaFt2: 120 } })));
    expect(e.field).toBe("facades.front.window.areaFt2");
    expect(e.message).toMatch(/exceed the front facade's gross wall area/);
    expect(e.range).toMatchObject({ max: 100 });
  });

  it("SHGC above 1", () => {
    const e = errorOf(() =>
      parsePlanInput(withFront({ grossWallAreaFt2: 400, window: { areaFt2: 40, shgc: 1.2 } })),
    );
    expect(e.field).toBe("facades.front.window.shgc");
    expect(e.range).toMatchObject({ min: 0, max: 1 });
  });

  it("unknown construction", () => {
    const e = errorOf(() => parsePlanInput({ ...base, wall: { baseId: "straw-bale", cavityR: 0 } }));
    expect(e.field).toBe("wall.baseId");
    expect(e.message).toMatch(/unknown wall construction "straw-bale"/);
    expect(e.message).toMatch(/wood-2x4-16in-oc/);
  });

  it("unknown duct location", () => {
    const e = errorOf(() => parsePlanInput({ ...base, ducts: { location: "roof" } }));
    expect(e.field).toBe("ducts.location");
    expect(e.message).toMatch(/unknown duct location "roof"/);
  });

  it("ducts placed in an attic the plan does not have", () => {
    const e = errorOf(() =>
      parsePlanInput({ ...base, attic: { kind: "encapsulated" }, ducts: { location: "vented-attic" } }),
    );
    expect(e.field).toBe("ducts.location");
  });

  it("no blower-door figure", () => {
    const e = errorOf(() => parsePlanInput({ ...base, infiltration: {} }));
    expect(e.field).toBe("infiltration.ach50");
  });

  it("reports every problem at once, not just the first", () => {
    const result = safeParsePlanInput({
      ...withFront({ grossWallAreaFt2: -1 }),
      bedrooms: 2.5,
      ducts: { location: "roof" },
    });
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.issues.map((i) => i.field).sort()).toEqual([
        "bedrooms",
        "ducts.location",
        "facades.front.grossWallAreaFt2",
      ]);
    }
  });

  it("computeFacingLoads validates too, and refuses a non-finite facing", () => {
    expect(() => computeFacingLoads(withFront({ grossWallAreaFt2: -1 }), SEA_LEVEL_SITE, 0)).toThrow(
      LoadInputError,
    );
    expect(errorOf(() => computeFacingLoads(base, SEA_LEVEL_SITE, Number.NaN)).field).toBe(
      "facingAzimuthDeg",
    );
  });
});

describe("bad site input", () => {
  it("wet bulb above dry bulb", () => {
    const e = errorOf(() => parseSiteConditions({ ...SEA_LEVEL_SITE, coolingOutdoorWbF: 99 }));
    expect(e.field).toBe("coolingOutdoorWbF");
  });
  it("latitude out of range", () => {
    const e = errorOf(() => parseSiteConditions({ ...SEA_LEVEL_SITE, latitudeDeg: 95 }));
    expect(e.field).toBe("latitudeDeg");
    expect(e.range).toMatchObject({ min: -66, max: 66 });
  });
});

describe("constructions", () => {
  it("cavity insulation that cannot fit its framing is refused, naming the field", () => {
    const e = errorOf(() => parsePlanInput({ ...base, wall: { baseId: "wood-2x4-16in-oc", cavityR: 38 } }));
    expect(e.field).toBe("wall.cavityR");
    expect(e.message).toMatch(/does not fit the 3.5 in cavity/);
    expect(e.range).toMatchObject({ max: 24.5 });
  });
});

describe("unknown keys are refused by name", () => {
  it("a misspelt plan key names itself and where it is", () => {
    const e = errorOf(() => parsePlanInput({ ...base, atic: { kind: "vented" } }));
    expect(e.field).toBe("(input)");
    expect(e.message).toMatch(/unknown field\(s\): atic/);
  });

  it("a misspelt nested key names its path", () => {
    const e = errorOf(() =>
      parsePlanInput(withFront({ grossWallAreaFt2: 400, window: { areaFt2: 40, shgcc: 0.3 } })),
    );
    expect(e.field).toBe("facades.front.window");
    expect(e.message).toMatch(/shgcc/);
  });

  it("a misspelt site key is refused", () => {
    const e = errorOf(() => parseSiteConditions({ ...SEA_LEVEL_SITE, dailyRange: 20 }));
    expect(e.message).toMatch(/unknown field\(s\): dailyRange/);
  });

  it("two leakage figures at once are refused", () => {
    const e = errorOf(() =>
      parsePlanInput({ ...base, infiltration: { ach50: 5, effectiveLeakageAreaIn2: 80 } }),
    );
    expect(e.field).toBe("infiltration.effectiveLeakageAreaIn2");
  });
});
