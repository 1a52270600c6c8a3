/** Events of the adaptive integrator (adaptive.ts): what an event is, compiled event sets and the reusable log of hits. */

export interface OdeEvent<P> {
  /**
   * Event function g(t, y); an event is a zero crossing of g. Must not allocate. At step ends the
   * driver also passes dy = f(t, y) (already computed by the stepper); inside a step (root search
   * on the dense output) dy is undefined.
   */
  readonly fn: (t: number, y: Float64Array, params: P, dy?: Float64Array) => number;
  /** −1: only crossings from g > 0 to g ≤ 0; +1: from g < 0 to g ≥ 0; 0: either. */
  readonly direction: -1 | 0 | 1;
  /** Stop the integration at this event. */
  readonly terminal: boolean;
  /** g uses dy: inside a step the driver passes the dense output's derivative (never the RHS). */
  readonly slope?: boolean;
  /** The right-hand side is not smooth where g = 0: restart the integration at the crossing. */
  readonly restart?: boolean;
  /** dg/dt at a step end (dy = f(t, y)); with `restart`, steps are cut to end at the predicted crossing. */
  readonly rate?: (t: number, y: Float64Array, params: P, dy: Float64Array) => number;
}

/** How the driver treats one event of an `EventSet`. */
export interface EventSpec {
  readonly direction: -1 | 0 | 1;
  readonly terminal: boolean;
  /** The event's g uses dy: the root search then passes the dense output's derivative. */
  readonly slope?: boolean;
  /** The right-hand side is not smooth where g = 0: restart the integration at the crossing. */
  readonly restart?: boolean;
}

/**
 * Every event of a run evaluated by one function (shared work, and no number returned per event, so
 * an optimised caller allocates nothing). Equivalent to an `OdeEvent[]`, which the driver wraps.
 */
export interface EventSet<P> {
  readonly specs: readonly EventSpec[];
  /**
   * Writes g_e(t, y) for every event e into `out`. `dy` is f(t, y) at step ends; inside a step it is the
   * dense output's derivative when the event searched has `slope`, else undefined. `only` (the root search) names
   * the one event whose value is read: an implementation may skip the others.
   */
  values(t: number, y: Float64Array, params: P, dy: Float64Array | undefined, out: Float64Array, only?: number): void;
  /** dg_e/dt at a step end (dy = f(t, y)) for the restart events; with it, steps end at predicted crossings. */
  rates?(t: number, y: Float64Array, params: P, dy: Float64Array, out: Float64Array): void;
}

/** The event-set form of a list of single events. */
export function eventSetFrom<P>(events: readonly OdeEvent<P>[]): EventSet<P> {
  const withRate = events.some((e) => e.restart && e.rate);
  return {
    specs: events,
    values(t, y, params, dy, out, only = -1) {
      if (only >= 0) out[only] = events[only].fn(t, y, params, dy);
      else for (let e = 0; e < events.length; e++) out[e] = events[e].fn(t, y, params, dy);
    },
    rates: withRate
      ? (t, y, params, dy, out) => {
          for (let e = 0; e < events.length; e++) {
            const r = events[e].rate;
            out[e] = r ? r(t, y, params, dy) : Number.NaN;
          }
        }
      : undefined,
  };
}

export interface EventHit {
  /** Index into the `events` array given to the driver. */
  readonly index: number;
  readonly t: number;
  readonly y: Float64Array;
}

/**
 * Event hits written into reusable buffers instead of `AdaptiveResult.events` (for callers that read
 * them before the next run: no allocation per hit). `reset()` is called by the driver at the start.
 */
export class EventLog {
  count = 0;
  index = new Int32Array(16);
  t = new Float64Array(16);
  y: Float64Array;

  constructor(readonly dim: number) {
    this.y = new Float64Array(16 * dim);
  }

  reset(): void {
    this.count = 0;
  }

  push(index: number, t: number, y: Float64Array): void {
    if (this.count >= this.t.length) {
      const grow = <T extends Float64Array | Int32Array>(a: T, size: number): T => {
        const b = new (a.constructor as new (n: number) => T)(size);
        b.set(a);
        return b;
      };
      this.index = grow(this.index, this.t.length * 2);
      this.y = grow(this.y, this.y.length * 2);
      this.t = grow(this.t, this.t.length * 2);
    }
    const k = this.count++;
    this.index[k] = index;
    this.t[k] = t;
    const at = k * this.dim;
    for (let i = 0; i < this.dim; i++) this.y[at + i] = y[i];
  }

  /** Copies the state of hit k into out. */
  copy(k: number, out: Float64Array): void {
    const at = k * this.dim;
    for (let i = 0; i < this.dim; i++) out[i] = this.y[at + i];
  }

  /** Component i of the state of hit k. */
  component(k: number, i: number): number {
    return this.y[k * this.dim + i];
  }
}
