/**
 * Runs one raw scenario file through core: parse, then the pipeline. Never throws; failures come back as
 * issues by scenario path so the fields can show them inline. Used by the worker and the capture route.
 */
import { parseScenario } from "../../core/scenario/parse";
import { runScenario } from "../../core/pipeline";
import { pendingRecordResult, INLINE_RECORD_STEPS } from "../record/pending";
import type { EngineIssue, EngineResponse } from "./messages";

/** Core's messages may already start with their path; fields show the message without it. */
export function withoutPathPrefix(path: string, message: string): string {
  return path !== "" && message.startsWith(`${path}: `) ? message.slice(path.length + 2) : message;
}

function summary(issues: readonly EngineIssue[]): string {
  return issues.map((i) => `${i.path || "scenario"}: ${i.message}`).join("; ");
}

function issuesOf(error: unknown): EngineIssue[] | null {
  if (typeof error !== "object" || error === null || !("issues" in error)) return null;
  const issues = (error as { issues: unknown }).issues;
  if (!Array.isArray(issues)) return null;
  return issues.map((issue: { path?: unknown; message?: unknown; value?: unknown; related?: unknown }) => {
    const path = typeof issue.path === "string" ? issue.path : "";
    return {
      path,
      message: withoutPathPrefix(path, typeof issue.message === "string" ? issue.message : String(issue.message)),
      ...(issue.value === undefined ? {} : { value: cloneable(issue.value) }),
      ...relatedOf(issue.related),
    };
  });
}

function relatedOf(related: unknown): { related?: string[] } {
  return Array.isArray(related) && related.length
    ? { related: related.filter((p): p is string => typeof p === "string") }
    : {};
}

/** Issue values go through postMessage; keep only plain data. */
function cloneable(value: unknown): unknown {
  try {
    return JSON.parse(JSON.stringify(value)) as unknown;
  } catch {
    return String(value);
  }
}

export function runFile(id: number, file: unknown): EngineResponse {
  const started = performance.now();
  try {
    const parsed = parseScenario(file);
    if (!parsed.ok) {
      const issues = parsed.issues.map((i) => ({
        path: i.path,
        message: withoutPathPrefix(i.path, i.message),
        ...(i.value === undefined ? {} : { value: cloneable(i.value) }),
        ...relatedOf(i.related),
      }));
      return { id, ok: false, issues, message: summary(issues) };
    }
    // A long record runs on the study workers with progress and Cancel (renderer/record); meanwhile the
    // stated conditions are shown with no verdict.
    const steps = parsed.scenario.ambient.record?.time.length ?? 0;
    const result =
      steps > INLINE_RECORD_STEPS
        ? pendingRecordResult(parsed.scenario)
        : runScenario(parsed.scenario, { includePath: true });
    return { id, ok: true, scenario: parsed.scenario, result, ms: performance.now() - started };
  } catch (error) {
    const issues = issuesOf(error) ?? [];
    const message = issues.length > 0 ? summary(issues) : error instanceof Error ? error.message : String(error);
    return { id, ok: false, issues, message };
  }
}
