/**
 * The one walker of the check-value tables (tests/check-values/<name>.json; DEVELOPERS.md rule 7). A table
 * names the function it checks and lists cases — inputs, the expected value, a tolerance and the published
 * source — and a written skip list in which every entry gives its reason. Each table becomes a `describe`
 * with a test that every case names an implemented function and its source, a test that every skipped
 * entry has a reason, and one test per case whose title carries the case's source.
 */
import { describe, expect, it } from "vitest";

export interface CheckCase {
  /** The function for this case, when not the table's. */
  readonly function?: string;
  readonly inputs: readonly number[];
  /** Field to read when the function returns an object (e.g. "riseEdge"). */
  readonly output?: string;
  readonly expected: number;
  readonly tolerance: { readonly absolute?: number; readonly relative?: number };
  /** Where the expected value comes from (authors, year, table or equation). */
  readonly provenance: string;
}

export interface CheckSkip {
  readonly what?: string;
  readonly inputs?: readonly number[];
  readonly reason: string;
}

export interface CheckTable {
  readonly name: string;
  readonly function: string;
  readonly cases: readonly CheckCase[];
  readonly skip: readonly CheckSkip[];
}

/** What an implementation may return: a number, an object holding the case's `output`, or null (no value). */
export type CheckResult = number | null | object;
export type CheckImplementations = Readonly<Record<string, (...inputs: number[]) => CheckResult>>;

/** The error a case allows: its absolute tolerance, else its relative one times |expected|, else 0. */
export function allowedError(c: CheckCase): number {
  if (c.tolerance.absolute !== undefined) return c.tolerance.absolute;
  return c.tolerance.relative !== undefined ? c.tolerance.relative * Math.abs(c.expected) : 0;
}

/** The number a case reads from a result: the result itself, or its `output` field; null if none. */
export function valueOfResult(got: CheckResult, output: string | undefined): number | null {
  if (got === null || typeof got === "number") return got;
  const value = output === undefined ? undefined : (got as Record<string, unknown>)[output];
  return typeof value === "number" ? value : null;
}

/** The source of a case, shortened for a test title (the whole text is in the failure message). */
function sourceInTitle(provenance: string): string {
  return provenance.length <= 70 ? provenance : `${provenance.slice(0, 69)}…`;
}

/** Describes every table under `title`, each case compared within its own tolerance. */
export function describeCheckValueTables(
  title: string,
  tables: readonly unknown[],
  implementations: CheckImplementations,
): void {
  describe(title, () => {
    for (const table of tables as readonly CheckTable[]) {
      describe(`${table.name} (${table.function})`, () => {
        it("has cases, each naming an implemented function and its source", () => {
          expect(table.cases.length, "a table without cases checks nothing").toBeGreaterThan(0);
          for (const c of table.cases) {
            const name = c.function ?? table.function;
            expect(implementations[name], `no implementation for ${name}`).toBeTypeOf("function");
            expect(c.provenance.length, "every check value names its source").toBeGreaterThan(10);
          }
        });
        it("gives a reason for every skipped entry", () => {
          for (const s of table.skip) {
            expect(s.reason.length, `skip ${s.what ?? JSON.stringify(s.inputs)} needs a reason`).toBeGreaterThan(10);
          }
        });
        table.cases.forEach((c, index) => {
          const name = c.function ?? table.function;
          const label = `${name}(${c.inputs.join(", ")})${c.output ? "." + c.output : ""}`;
          it(`case ${index + 1}: ${label} ≈ ${c.expected} — ${sourceInTitle(c.provenance)}`, () => {
            const allowed = allowedError(c);
            expect(allowed, "every case needs a tolerance").toBeGreaterThan(0);
            const got = valueOfResult(implementations[name]!(...c.inputs), c.output);
            expect(got, `${c.provenance} — no value returned`).not.toBeNull();
            expect(Math.abs((got as number) - c.expected), `${c.provenance} — got ${got}`).toBeLessThanOrEqual(allowed);
          });
        });
      });
    }
  });
}
