import { describe, expect, it } from "vitest";
import { z } from "zod";
import { idQueryParam, parseId } from "@/lib/http/ids";

// Number() reads every one of these as 1 (or another number); none is how the app writes an id.
const NOT_IDS = [
  "1e0",
  "0x1",
  "0b1",
  "0o1",
  "01",
  "1.0",
  "1.",
  " 1",
  "1 ",
  "+1",
  "-1",
  "0",
  "",
  "1_000",
  "١",
  "Infinity",
  "9007199254740993",
  "12345678901234567",
];

describe("strict record ids", () => {
  it("reads plain decimal digits", () => {
    expect(parseId("1")).toBe(1);
    expect(parseId("42")).toBe(42);
    expect(parseId("9007199254740991")).toBe(Number.MAX_SAFE_INTEGER);
    expect(parseId(7)).toBe(7);
  });

  for (const text of NOT_IDS) {
    it(`refuses ${JSON.stringify(text)}`, () => {
      expect(parseId(text)).toBeNull();
    });
  }

  it("refuses numbers that are not positive safe integers, and other types", () => {
    for (const value of [0, -3, 1.5, Number.NaN, 2 ** 60, null, undefined, {}, [1], true])
      expect(parseId(value)).toBeNull();
  });

  it("the query-string schema turns an id into a number and names a bad one", () => {
    const schema = z.object({ communityId: idQueryParam.optional() });
    expect(schema.parse({ communityId: "12" })).toEqual({ communityId: 12 });
    expect(schema.parse({})).toEqual({});
    const bad = schema.safeParse({ communityId: "1e0" });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0]).toMatchObject({
      path: ["communityId"],
      message: expect.stringContaining("record id"),
    });
  });
});
