// A command-line mistake (unknown flag, missing file, not JSON): one line on stderr and exit code 2, like bad input.
export class UsageError extends Error {}
