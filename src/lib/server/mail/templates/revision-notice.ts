/** What every revision notice names: the formulation, the revision and a link to it. */
export interface RevisionNotice {
  code: string;
  name: string;
  revisionNo: number;
  /** One line of predicted metrics, e.g. "3005 K, Duv 0.0012, Ra 91, R9 52". */
  summary: string;
  link: string;
}
