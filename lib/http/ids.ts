import { z } from "zod";

/**
 * Record ids are positive whole numbers written plainly in decimal: "12". Number() would also read
 * "1e0", "0x1", "0b1", " 1", "1.0" and "01" as 1, so two spellings could name one record; none of
 * them is an id here. Every id from a URL, a query string or a cookie goes through this one helper.
 */
const ID_TEXT = /^[1-9][0-9]{0,15}$/;

export function parseId(value: unknown): number | null {
  if (typeof value === "number") return Number.isSafeInteger(value) && value > 0 ? value : null;
  if (typeof value !== "string" || !ID_TEXT.test(value)) return null;
  const id = Number(value);
  return Number.isSafeInteger(id) ? id : null;
}

const ID_MESSAGE = "must be a record id: a whole number above 0 written in digits, like 12";

/** An id in a query string, for zod query schemas: "12" → 12; anything else is a field error. */
export const idQueryParam = z
  .string()
  .refine((text) => parseId(text) !== null, { error: ID_MESSAGE })
  .transform((text) => parseId(text)!);
