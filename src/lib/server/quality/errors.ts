/** Typed refusals of the quality services; pages and endpoints turn them into 400/403/404/409/413/422 answers. */
export interface QualityIssue {
  line: number | null;
  message: string;
}

export class QualityError extends Error {
  constructor(readonly status: number, message: string, readonly issues: QualityIssue[] = []) {
    super(message);
  }
}

export const notFound = (what: string) => new QualityError(404, `${what} was not found.`);
export const conflict = (message: string) => new QualityError(409, message);
export const forbidden = (message: string) => new QualityError(403, message);
export const invalid = (message: string, issues: QualityIssue[] = []) => new QualityError(400, message, issues);
