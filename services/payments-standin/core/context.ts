import type { EventBus } from "../webhooks/events";
import type { Store } from "./store";

export interface StandinContext {
  store: Store;
  events: EventBus;
  /** Base URL for links handed to browsers (hosted payment and onboarding pages). */
  publicUrl(): string;
}
