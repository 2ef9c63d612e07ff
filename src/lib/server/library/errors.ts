/** Refusals of the material library: domain errors, answered by kind (400/404/409/413/415/422, see ../http/status.ts). */
import { conflict, notFound as notFoundError } from '../../errors/domain-error';

export const notFound = (id: number | string) => notFoundError(`Material ${id} was not found.`);

export const staleVersion = (current: number, sent: number) =>
  conflict(
    `This material was changed by someone else since you opened it (you edited ` +
      `version ${sent}, it is now at version ${current}). Nothing was saved: reload ` +
      `it, then make your change again.`
  );
