/** A user-facing CLI failure: printed as one line, no stack trace, exit status 1 (2 for usage errors). */
export class CliError extends Error {
  readonly exitCode: number;

  constructor(message: string, exitCode = 1) {
    super(message);
    this.name = 'CliError';
    this.exitCode = exitCode;
  }
}
