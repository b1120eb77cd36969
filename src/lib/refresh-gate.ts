/**
 * Coalesces bursts of "something changed" signals into as few refreshes as possible without ever
 * missing the last change. A refresh starts at once when none is running; signals that arrive while
 * one runs are folded into a single follow-up refresh once it ends. (Restarting the refresh on
 * every signal instead would starve it during a burst: eight new triggers and their notification
 * events arrive within a second, and the list would show none of them until the burst is over.)
 */
export function createRefreshGate(refresh: () => Promise<unknown>) {
  let running = false;
  let again = false;

  async function run(): Promise<void> {
    running = true;
    try {
      do {
        again = false;
        try {
          await refresh();
        } catch {
          // A failed refresh is the query's own error to show; the gate only keeps order.
        }
      } while (again);
    } finally {
      running = false;
    }
  }

  return {
    /** Asks for a refresh; returns at once. */
    request(): void {
      if (running) again = true;
      else void run();
    },
    isRunning: () => running,
  };
}
