/**
 * Turns a `Retry-After` header (seconds or an HTTP date) into a sentence such as
 * "Try again in 3 minutes."; without a usable header it says "Try again later."
 */
export function retryAfterText(header: string | null, now: Date = new Date()): string {
  if (!header) {
    return 'Try again later.';
  }
  let seconds = Number(header);
  if (!Number.isFinite(seconds)) {
    const at = Date.parse(header);
    if (Number.isNaN(at)) {
      return 'Try again later.';
    }
    seconds = (at - now.getTime()) / 1000;
  }
  seconds = Math.max(1, Math.ceil(seconds));
  if (seconds < 60) {
    return `Try again in ${seconds} second${seconds === 1 ? '' : 's'}.`;
  }
  const minutes = Math.ceil(seconds / 60);
  return `Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`;
}
