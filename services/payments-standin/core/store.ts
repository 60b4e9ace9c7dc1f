import { mkdirSync, readFileSync, renameSync, writeFileSync } from "node:fs";
import path from "node:path";

import { emptyState, type StandinState } from "./state";

const MAX_EVENTS = 1000;
const IDEMPOTENCY_TTL_SECONDS = 24 * 60 * 60;

/** In-memory state, written whole to a JSON file (when one is given) after each change. */
export class Store {
  readonly state: StandinState;

  constructor(private readonly dataFile?: string) {
    this.state = dataFile ? load(dataFile) : emptyState();
  }

  now(): number {
    return Math.floor(Date.now() / 1000) + this.state.clock_offset;
  }

  reset(): void {
    Object.assign(this.state, emptyState());
    this.persist();
  }

  persist(): void {
    this.prune();
    if (!this.dataFile) return;
    mkdirSync(path.dirname(this.dataFile), { recursive: true });
    const tmp = `${this.dataFile}.${process.pid}.tmp`;
    writeFileSync(tmp, JSON.stringify(this.state));
    renameSync(tmp, this.dataFile);
  }

  private prune(): void {
    const { state } = this;
    if (state.events.length > MAX_EVENTS) state.events.splice(0, state.events.length - MAX_EVENTS);
    const cutoff = this.now() - IDEMPOTENCY_TTL_SECONDS;
    for (const [key, record] of Object.entries(state.idempotency)) {
      if (record.created < cutoff) delete state.idempotency[key];
    }
  }
}

function load(dataFile: string): StandinState {
  let text: string;
  try {
    text = readFileSync(dataFile, "utf8");
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "ENOENT") return emptyState();
    throw err;
  }
  try {
    const parsed = JSON.parse(text) as Partial<StandinState>;
    if (parsed.version !== 1) throw new Error(`unknown version ${String(parsed.version)}`);
    return { ...emptyState(), ...parsed };
  } catch (err) {
    // Keep the unreadable file for inspection instead of overwriting it on the next save.
    const aside = `${dataFile}.unreadable-${Date.now()}`;
    renameSync(dataFile, aside);
    console.warn(`[payments-standin] could not read ${dataFile} (${(err as Error).message}); moved it to ${aside} and started empty`);
    return emptyState();
  }
}
