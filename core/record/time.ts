/**
 * Times of an ambient record: plain numbers are seconds from the start; strings are a number with a time
 * unit ("3 h", "90 min", "1.5 d") or an ISO 8601 date-time with a zone ("2031-03-01T00:00:00Z",
 * "2031-03-01T06:00+04:00"). Date-times are taken relative to the first one. One record uses one form:
 * either every time is a date-time or none is.
 */

const UNIT_SECONDS: Readonly<Record<string, number>> = {
  s: 1,
  sec: 1,
  secs: 1,
  second: 1,
  seconds: 1,
  min: 60,
  mins: 60,
  minute: 60,
  minutes: 60,
  h: 3600,
  hr: 3600,
  hrs: 3600,
  hour: 3600,
  hours: 3600,
  d: 86400,
  day: 86400,
  days: 86400,
};

/** Names of the time units accepted, for messages and the CSV header. */
export const TIME_UNITS = Object.keys(UNIT_SECONDS);

/** Seconds in one `unit` (case-insensitive), or null for an unknown unit. */
export function secondsPerUnit(unit: string): number | null {
  return UNIT_SECONDS[unit.trim().toLowerCase()] ?? null;
}

// A calendar date, a "T" or space, a clock time, then Z or an offset: the zone is required, so the same
// text means the same instant on every machine.
const ISO_DATE_TIME = /^\d{4}-\d{2}-\d{2}[T ]\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})$/i;
const NUMBER_UNIT = /^([-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?)\s*([a-z]*)$/i;

export type TimeParse =
  | { readonly ok: true; readonly kind: "seconds"; readonly value: number }
  | { readonly ok: true; readonly kind: "date-time"; readonly value: number; readonly text: string }
  | { readonly ok: false; readonly message: string };

export const TIME_EXPECTATION =
  'must be seconds from the start (a number), a number with a time unit ("3 h", "90 min") or an ISO 8601 date-time with a zone ("2031-03-01T06:00:00Z")';

/** One time value: seconds (relative) or a date-time (milliseconds since 1970, to be made relative). */
export function parseTime(raw: unknown): TimeParse {
  if (typeof raw === "number") {
    return Number.isFinite(raw) ? { ok: true, kind: "seconds", value: raw } : { ok: false, message: TIME_EXPECTATION };
  }
  if (typeof raw !== "string") return { ok: false, message: TIME_EXPECTATION };
  const text = raw.trim();
  if (ISO_DATE_TIME.test(text)) {
    const ms = Date.parse(text.replace(" ", "T"));
    if (!Number.isFinite(ms)) return { ok: false, message: `is not a valid date-time; ${TIME_EXPECTATION}` };
    return { ok: true, kind: "date-time", value: ms, text };
  }
  const m = NUMBER_UNIT.exec(text);
  if (!m) return { ok: false, message: TIME_EXPECTATION };
  const v = Number(m[1]);
  const unit = m[2] === "" ? "s" : m[2]!;
  const f = secondsPerUnit(unit);
  if (f === null)
    return { ok: false, message: `has a time unit Brinefield does not know ("${unit}"); use one of s, min, h, d` };
  if (!Number.isFinite(v * f)) return { ok: false, message: TIME_EXPECTATION };
  return { ok: true, kind: "seconds", value: v * f };
}

/** A readable time from the start: "36 h", "2.5 d", "90 s". */
export function formatElapsed(seconds: number): string {
  const r = (v: number) => String(Math.round(v * 100) / 100);
  if (Math.abs(seconds) >= 2 * 86400) return `${r(seconds / 86400)} d`;
  if (Math.abs(seconds) >= 3600) return `${r(seconds / 3600)} h`;
  if (Math.abs(seconds) >= 60) return `${r(seconds / 60)} min`;
  return `${r(seconds)} s`;
}
