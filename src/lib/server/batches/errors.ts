/** Refusals of the batch services: domain errors, answered by kind (400/403/404/409/422, see ../http/status.ts). */
import { notFound as notFoundError, unprocessable, type Issue } from '../../errors/domain-error';

export { conflict, invalid } from '../../errors/domain-error';
export const notFound = (what: string) => notFoundError(`${what} was not found.`);
/** Well-formed input that describes an impossible batch (weigh-out refusals). */
export const impossible = (issues: Issue[]) =>
  unprocessable(`The batch cannot be weighed out: ${issues.map((i) => i.message).join('; ')}`, issues);
