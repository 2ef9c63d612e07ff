/**
 * What a batch disposition signature binds to: the decision, meaning, comment, signer and time,
 * the acceptance in force, every measured part's result and the raw files' SHA-256 — as canonical
 * JSON (formulations' canonicalJson: sorted keys, no whitespace), hashed with SHA-256
 * (model: 21 CFR 11.70, signature bound to the record).
 */
import { createHash } from 'node:crypto';
import { canonicalJson } from '../../formulations/canonical-json';
import type { JudgedBatch } from '../../measurements/index';
import { QUALITY_CORE_VERSION } from '../../measurements/version';

export interface DispositionFacts {
  batch: { id: number; batchNumber: string; revisionId: number; formulationCode: string; revisionNo: number };
  decision: 'released' | 'rejected';
  meaning: string;
  comment: string;
  signer: { id: number; name: string; email: string };
  signedAt: Date;
  files: { uploadId: number; name: string; sha256: string }[];
  judged: JudgedBatch;
}

const r6 = (v: number | null) => (v === null ? null : Number(v.toFixed(6)));

export function dispositionDocument(f: DispositionFacts): Record<string, unknown> {
  const s = f.judged.summary;
  return {
    kind: 'phosforge batch disposition',
    batch: f.batch,
    decision: f.decision,
    meaning: f.meaning,
    comment: f.comment,
    signer: f.signer,
    signedAt: f.signedAt.toISOString(),
    acceptance: f.judged.acceptance,
    target: { label: f.judged.target.label, x: r6(f.judged.target.x), y: r6(f.judged.target.y) },
    coreVersion: QUALITY_CORE_VERSION,
    files: f.files,
    summary: { parts: s.parts, passed: s.passed, meanX: r6(s.meanPoint?.x ?? null), meanY: r6(s.meanPoint?.y ?? null) },
    parts: f.judged.parts.map((p) => ({
      label: p.label,
      x: r6(p.metrics.x),
      y: r6(p.metrics.y),
      cct: r6(p.metrics.cct),
      duv: r6(p.metrics.duv),
      ra: r6(p.metrics.ra),
      r9: r6(p.metrics.r9),
      pass: p.verdict.pass
    }))
  };
}

export function signedJsonAndHash(f: DispositionFacts): { json: string; sha256: string } {
  const json = canonicalJson(dispositionDocument(f));
  return { json, sha256: createHash('sha256').update(json, 'utf8').digest('hex') };
}
