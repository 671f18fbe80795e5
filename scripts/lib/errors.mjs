/**
 * A problem the person running the command can fix: printed as one line, never as a stack.
 */
export class SetupError extends Error {
  constructor(message) {
    super(message);
    this.name = 'SetupError';
  }
}

/** Runs a script's main function; a SetupError becomes one line on stderr and exit code 1. */
export function runMain(main) {
  main().catch((error) => {
    if (error instanceof SetupError) {
      console.error(`mixmark: ${error.message}`);
    } else {
      console.error(`mixmark: unexpected failure: ${error?.stack ?? error}`);
    }
    process.exit(1);
  });
}
