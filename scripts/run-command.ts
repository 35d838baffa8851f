/** Runs a command-line task: its error's message (not a stack trace) and exit code 1 when it fails. */
export function runCommand(task: () => Promise<void> | void): void {
  Promise.resolve()
    .then(task)
    .catch((error: unknown) => {
      console.error(error instanceof Error ? error.message : error);
      process.exit(1);
    });
}
