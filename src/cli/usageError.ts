/** A command line that cannot be run as given; main prints its message and exits with 2. */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}
