/** Typed failures of the material library; `status` is the HTTP status pages and the API answer with. */
export class MaterialError extends Error {
  constructor(readonly status: 400 | 404 | 409 | 413 | 415 | 422, message: string, readonly details?: { line: number | null; message: string }[]) {
    super(message);
  }
}

export const notFound = (id: number | string) => new MaterialError(404, `Material ${id} was not found.`);

export const staleVersion = (current: number, sent: number) =>
  new MaterialError(409, `This material was changed by someone else since you opened it (you edited version ${sent}, it is now at version ${current}). Nothing was saved: reload it, then make your change again.`);
