/** Typed refusals of the batch services; pages and endpoints turn them into 400/403/404/409/422 answers. */
export class BatchError extends Error {
  constructor(readonly status: number, message: string, readonly issues: { path: string; message: string }[] = []) {
    super(message);
  }
}

export const notFound = (what: string) => new BatchError(404, `${what} was not found.`);
export const conflict = (message: string) => new BatchError(409, message);
export const invalid = (message: string, issues: { path: string; message: string }[] = []) => new BatchError(400, message, issues);
/** Well-formed input that describes an impossible batch (weigh-out refusals). */
export const impossible = (issues: { path: string; message: string }[]) =>
  new BatchError(422, `The batch cannot be weighed out: ${issues.map((i) => i.message).join('; ')}`, issues);
