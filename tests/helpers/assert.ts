/**
 * Shared assertion helpers for physics tests. `assertInDelta` recurses into arrays and objects and
 * reports the path of the first value out of tolerance.
 */
import { expect } from "vitest";

export function assertInDelta(actual: unknown, expected: unknown, delta: number, message: string, path = ""): void {
  if (typeof expected === "number") {
    expect(typeof actual, `${message}${path}: expected a number`).toBe("number");
    const ok =
      Math.abs((actual as number) - expected) <= delta || (Number.isNaN(expected) && Number.isNaN(actual as number));
    expect(ok, `${message}${path}: ${actual} is not within ${delta} of ${expected}`).toBe(true);
    return;
  }
  if (Array.isArray(expected)) {
    expect(Array.isArray(actual), `${message}${path}: expected an array`).toBe(true);
    expect((actual as unknown[]).length, `${message}${path}: array length`).toBe(expected.length);
    expected.forEach((e, i) => assertInDelta((actual as unknown[])[i], e, delta, message, `${path}[${i}]`));
    return;
  }
  if (expected && typeof expected === "object") {
    for (const [k, v] of Object.entries(expected))
      assertInDelta((actual as Record<string, unknown>)?.[k], v, delta, message, `${path}.${k}`);
    return;
  }
  expect(actual, `${message}${path}`).toBe(expected);
}

/** Relative closeness: |a − e| ≤ rel·|e|. */
export function assertRelative(actual: number, expected: number, rel: number, message: string): void {
  const ok = Math.abs(actual - expected) <= rel * Math.abs(expected);
  expect(ok, `${message}: ${actual} is not within ${(rel * 100).toFixed(3)} % of ${expected}`).toBe(true);
}
