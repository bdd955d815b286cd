/** Thrown when the raw store holds nothing under a key the database names. */
export class RawObjectMissingError extends Error {
  constructor(readonly key: string) {
    super(`the raw store holds no object under ${key}`);
    this.name = 'RawObjectMissingError';
  }
}
