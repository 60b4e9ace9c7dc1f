/**
 * Fault injection for the crash trials (tests/server): with GRADELINE_CRASH_AT=<name> the process
 * kills itself at that point, as a power cut would. Unset (always, outside those tests) it does nothing.
 */
export function crashPoint(name: string): void {
  if (process.env.GRADELINE_CRASH_AT && process.env.GRADELINE_CRASH_AT === name) process.kill(process.pid, "SIGKILL");
}
