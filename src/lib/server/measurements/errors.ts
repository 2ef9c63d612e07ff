/** Refusals of the quality services: domain errors, answered by kind (400/403/404/409/413/422, see ../http/status.ts). */
import { notFound as notFoundError } from '../../errors/domain-error';

export { conflict, forbidden, invalid } from '../../errors/domain-error';
export const notFound = (what: string) => notFoundError(`${what} was not found.`);
