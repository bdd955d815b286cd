import { createHash, type Hash } from 'node:crypto';
import { Transform, type TransformCallback } from 'node:stream';

/** A pass-through stream that feeds every byte to a SHA-256 hash and counts them. */
export class HashingStream extends Transform {
  private readonly hash: Hash = createHash('sha256');
  /** Bytes seen so far. */
  size = 0;

  override _transform(chunk: Buffer, _encoding: BufferEncoding, callback: TransformCallback): void {
    this.hash.update(chunk);
    this.size += chunk.length;
    callback(null, chunk);
  }

  /** The hex digest; call once, after the stream has ended. */
  digest(): string {
    return this.hash.digest('hex');
  }
}
