import { mkdirSync, readFileSync, renameSync, writeFileSync } from "node:fs";
import { dirname } from "node:path";

/** A Stripe-shaped object as the fake stores it. */
export type TObj = { id: string; object: string; [key: string]: unknown };

export type TDelivery = { eventId: string; attempt: number; dueAt: number };

export type TFakeState = {
  objects: Record<string, TObj>;
  /** Idempotency-Key → the first answer and a fingerprint of its parameters. */
  idempotency: Record<string, { fingerprint: string; status: number; body: unknown }>;
  deliveries: TDelivery[];
  counter: number;
};

/** The fake's state, kept in memory and, when a file is given, rewritten after every change. */
export class FakeStore {
  state: TFakeState;
  constructor(private readonly file?: string) {
    this.state = { objects: {}, idempotency: {}, deliveries: [], counter: 0 };
    if (file) {
      try {
        this.state = JSON.parse(readFileSync(file, "utf8")) as TFakeState;
      } catch {
        // no state yet: start empty
      }
    }
  }

  newId(prefix: string): string {
    this.state.counter += 1;
    const rand = Math.random().toString(36).slice(2, 10);
    return `${prefix}_${this.state.counter.toString(36).padStart(4, "0")}${rand}`;
  }

  get<T extends TObj = TObj>(id: string): T | undefined {
    return this.state.objects[id] as T | undefined;
  }

  put<T extends TObj>(obj: T): T {
    this.state.objects[obj.id] = obj;
    return obj;
  }

  all(object: string): TObj[] {
    return Object.values(this.state.objects).filter((o) => o.object === object);
  }

  save(): void {
    if (!this.file) return;
    mkdirSync(dirname(this.file), { recursive: true });
    const tmp = `${this.file}.tmp`;
    writeFileSync(tmp, JSON.stringify(this.state));
    renameSync(tmp, this.file);
  }
}
