import { useSyncExternalStore } from 'react';

// One shared ticker for every running clock on the page. The time is an
// external source that changes on its own, which is what
// useSyncExternalStore is for (no effect, no state copy).

const TICK_MS = 15_000;
let now = Date.now();
const listeners = new Set<() => void>();
let timer: ReturnType<typeof setInterval> | null = null;

function subscribe(listener: () => void) {
  listeners.add(listener);
  if (!timer) {
    now = Date.now();
    timer = setInterval(() => {
      now = Date.now();
      for (const l of listeners) l();
    }, TICK_MS);
  }
  return () => {
    listeners.delete(listener);
    if (listeners.size === 0 && timer) {
      clearInterval(timer);
      timer = null;
    }
  };
}

/**
 * The current time in ms, refreshed every 15 s while `running` (a hold
 * clock counts whole minutes, so that is fine-grained enough).
 */
export function useNow(running: boolean): number {
  return useSyncExternalStore(running ? subscribe : noSubscribe, getNow, getNow);
}

const getNow = () => now;
const noSubscribe = () => () => {};
