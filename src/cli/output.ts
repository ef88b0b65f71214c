import type { Writable } from 'node:stream';

/** Text is gathered to about this many characters before each write to the stream. */
const CHUNK = 1 << 16;

/**
 * Writes lines to a stream in large chunks, each awaited until the stream has taken it, so
 * output of any length stays within bounded memory and a failed write (a full disk, a closed
 * pipe) rejects here instead of surfacing later as an unhandled 'error' event.
 */
export class LineWriter {
  private buffer = '';

  constructor(private readonly stream: Writable) {
    // The write callbacks carry every error; this only keeps 'error' from being unhandled.
    stream.on('error', ignore);
  }

  async line(text: string): Promise<void> {
    this.buffer += text + '\n';
    if (this.buffer.length >= CHUNK) await this.flush();
  }

  /** Writes whatever is gathered and waits until the stream has taken it. */
  async flush(): Promise<void> {
    if (this.buffer === '') return;
    const chunk = this.buffer;
    this.buffer = '';
    await new Promise<void>((resolve, reject) => {
      this.stream.write(chunk, (error) => (error ? reject(error) : resolve()));
    });
  }
}

function ignore(): void {}
