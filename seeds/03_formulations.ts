/**
 * Demo formulations of Kestrel Hollow Lighting (invented) and the two-part silicone systems of the
 * invented supplier Brackenfield Silicones. Predicted metrics are computed by the spectral core
 * from the library's materials (looked up by code); without them the formulations are skipped.
 * Optical fractions were found with the blend solver (maxLer at the target, floors as named);
 * wt % with the loading model at an effective path of 0.3 mm. Idempotent (keyed by name / code).
 */
import type { Knex } from 'knex';
import { parseRecipe, type RevisionContent } from '../src/lib/recipe';
import type { RevisionState } from '../src/lib/formulations/workflow-rules';
import { PREDICTION_CORE_VERSION, predictRevision } from '../src/lib/formulations/prediction';
import { loadRevisionComponents } from '../src/lib/server/formulations/components';
import { contentSha256 } from '../src/lib/server/formulations/hash';

const SILICONE_CAUTION =
  'Uncured parts A and B irritate skin and eyes: wear nitrile gloves and eye ' +
  'protection. The Si–H crosslinker can release hydrogen with acids, bases, ' +
  'alcohols or moisture — never close mixed material in a sealed container. Cure ' +
  'is inhibited by sulfur, amines, organotin and some fluxes. Ventilate the ' +
  'cure-oven exhaust; vacuum degassing carries implosion and splash risk. Follow ' +
  "the supplier's safety data sheet, your site's rules and local codes.";

export const SILICONE_SYSTEMS = [
  {
    name: 'Brackenfield LX-11 clear methyl encapsulant',
    supplier: 'Brackenfield Silicones',
    ratio_a: 1,
    ratio_b: 1,
    pot_life_min: 240,
    cure: '1 h at 80 °C, then 2 h at 150 °C',
    degas_notes:
      'Planetary mixer 2 min at 2000 rpm (mix and deaerate), or vacuum below 5 kPa for ' +
      "15 min after hand mixing. Dispense within the plant's slurry-age limit.",
    density_g_cm3: 1.08,
    refractive_index: 1.41
  },
  {
    name: 'Brackenfield PH-24 phenyl high-index encapsulant',
    supplier: 'Brackenfield Silicones',
    ratio_a: 1,
    ratio_b: 1,
    pot_life_min: 180,
    cure: '1 h at 100 °C, then 3 h at 150 °C',
    degas_notes:
      'Warm parts to 25 °C before mixing; vacuum below 3 kPa for 20 min (viscous: allow for foaming, fill the cup at most half).',
    density_g_cm3: 1.12,
    refractive_index: 1.53
  },
  {
    name: 'Brackenfield GP-10 general-purpose PDMS',
    supplier: 'Brackenfield Silicones',
    ratio_a: 10,
    ratio_b: 1,
    pot_life_min: 90,
    cure: '4 h at 65 °C or 24 h at 25 °C',
    degas_notes:
      'Weigh part B on the precision balance (10:1 is sensitive to ratio error); ' +
      'vacuum below 5 kPa for 10–15 min until the foam collapses.',
    density_g_cm3: 1.03,
    refractive_index: 1.41
  }
];

type DemoRevision = {
  state: RevisionState;
  leak: number;
  phosphors: [code: string, fraction: number, wtPct: number | null][];
  floors: RevisionContent['floors'];
  notes: string;
  createdAt: string;
  submittedAt?: string;
  decidedAt?: string;
  supersededAt?: string;
  comment?: string;
};

const DEMO = [
  {
    code: 'KH-W30-90',
    name: 'Warm white 3000 K, Ra 90',
    description: 'Downlight module, 3000 K nominal, 90 CRI market class.',
    author: 'rhea.okafor',
    cct: 3000,
    silicone: 0,
    revisions: [
      {
        state: 'superseded',
        leak: 0.074,
        phosphors: [
          ['GL-530', 0.2239, 7.71],
          ['YL-568', 0.2984, 8.95],
          ['RD-625', 0.4037, 7.7]
        ],
        floors: { raMin: 90 },
        notes: 'First release: Ra 90 floor only.',
        createdAt: '2026-09-14T09:12:00Z',
        submittedAt: '2026-09-15T10:02:00Z',
        decidedAt: '2026-09-16T14:30:00Z',
        supersededAt: '2026-10-21T11:05:00Z',
        comment: 'Matches the lab builds of lot trial T-0914.'
      },
      {
        state: 'approved',
        leak: 0.07,
        phosphors: [
          ['GL-530', 0.2667, 9.32],
          ['YL-568', 0.2346, 7.14],
          ['RD-625', 0.4287, 8.29]
        ],
        floors: { raMin: 90, r9Min: 50 },
        notes: 'More RD-625 to lift R9 to the 90 CRI class (R9 ≥ 50).',
        createdAt: '2026-10-19T08:40:00Z',
        submittedAt: '2026-10-20T09:15:00Z',
        decidedAt: '2026-10-21T11:05:00Z',
        comment: 'R9 floor met; weigh-out checked against trial T-1019.'
      }
    ] as DemoRevision[]
  },
  {
    code: 'KH-W40-80',
    name: 'Neutral white 4000 K, Ra 80',
    description: 'Linear module for offices, 80 CRI.',
    author: 'jonah.pell',
    cct: 4000,
    silicone: 2,
    revisions: [
      {
        state: 'approved',
        leak: 0.1515,
        phosphors: [
          ['GL-530', 0.1458, 4.15],
          ['YL-568', 0.5195, 12.92],
          ['RD-625', 0.1832, 2.89]
        ],
        floors: { raMin: 80 },
        notes: 'High-efficacy blend; Ra 80 with a small margin.',
        createdAt: '2026-10-02T13:00:00Z',
        submittedAt: '2026-10-03T08:30:00Z',
        decidedAt: '2026-10-05T16:45:00Z',
        comment: 'Approved for the linear range.'
      }
    ] as DemoRevision[]
  },
  {
    code: 'KH-W27-95',
    name: 'Warm white 2700 K, high R9',
    description: 'Hospitality spot with a line-emitting red for high R9.',
    author: 'jonah.pell',
    cct: 2700,
    silicone: 1,
    revisions: [
      {
        state: 'draft',
        leak: 0.0712,
        phosphors: [
          ['YL-568', 0.6662, null],
          ['NR-631', 0.2626, null]
        ],
        floors: { raMin: 90, r9Min: 80 },
        notes:
          'Draft: wt % not modelled yet (NR-631 absorbs weakly; needs a thicker layer ' +
          'study). Fluoride phosphor: keep dry, no acid contact.',
        createdAt: '2026-11-24T10:20:00Z'
      }
    ] as DemoRevision[]
  },
  {
    code: 'KH-W35-90',
    name: 'Warm white 3500 K, Ra 90',
    description: 'Retail track light, 3500 K.',
    author: 'rhea.okafor',
    cct: 3500,
    silicone: 0,
    revisions: [
      {
        state: 'submitted',
        leak: 0.1026,
        phosphors: [
          ['GL-530', 0.2952, 9.36],
          ['YL-568', 0.2539, 7.01],
          ['RD-625', 0.3483, 6.11]
        ],
        floors: { raMin: 90, r9Min: 50 },
        notes: 'Same phosphor set as KH-W30-90 rev 2, retargeted to 3500 K.',
        createdAt: '2026-11-27T09:00:00Z',
        submittedAt: '2026-11-30T15:20:00Z'
      }
    ] as DemoRevision[]
  }
];

const email = (handle: string) => `${handle}@kestrelhollow.example`;

async function seedSilicones(knex: Knex): Promise<number[]> {
  const ids: number[] = [];
  for (const s of SILICONE_SYSTEMS) {
    const found = await knex('silicone_systems').where({ name: s.name }).first('id');
    ids.push(found ? found.id : (await knex('silicone_systems').insert({ ...s, safety_note: SILICONE_CAUTION }))[0]);
  }
  return ids;
}

export async function seed(knex: Knex): Promise<void> {
  const siliconeIds = await seedSilicones(knex);
  const codes = [...new Set(['B-450', ...DEMO.flatMap((f) => f.revisions.flatMap((r) => r.phosphors.map((p) => p[0])))])];
  const materials = await knex('materials').whereIn('code', codes).select('id', 'code', 'name');
  const byCode = new Map(materials.map((m) => [m.code as string, m as { id: number; code: string; name: string }]));
  const missing = codes.filter((c) => !byCode.has(c));
  if (missing.length) {
    console.log(
      `seed 03_formulations: materials ${missing.join(', ')} are not in the library; demo formulations skipped (silicone systems seeded).`
    );
    return;
  }
  const people = new Map(
    (
      await knex('users')
        .whereIn('email', [email('rhea.okafor'), email('jonah.pell'), email('ines.halloran')])
        .select('id', 'email', 'name')
    ).map((u) => [u.email as string, u as { id: number; email: string; name: string }])
  );
  const quality = people.get(email('ines.halloran'));
  if (!quality) {
    console.log('seed 03_formulations: demo users missing; demo formulations skipped.');
    return;
  }
  const silicones = await knex('silicone_systems').whereIn('id', siliconeIds);
  for (const f of DEMO) {
    if (await knex('formulations').where({ code: f.code }).first('id')) continue;
    const author = people.get(email(f.author))!;
    await knex.transaction(async (trx) => {
      const [formulationId] = await trx('formulations').insert({
        code: f.code,
        name: f.name,
        description: f.description,
        created_by: author.id,
        created_at: new Date(f.revisions[0].createdAt)
      });
      await audit(trx, author, 'formulation', formulationId, 'create', f.revisions[0].createdAt, null, { code: f.code, name: f.name });
      const s = silicones.find((x) => x.id === siliconeIds[f.silicone])!;
      let previous: number | null = null;
      for (const [i, r] of f.revisions.entries()) {
        const raw = {
          pump: { materialId: byCode.get('B-450')!.id, code: 'B-450', name: byCode.get('B-450')!.name },
          phosphors: r.phosphors.map(([code, opticalFraction, wtPct]) => ({
            materialId: byCode.get(code)!.id,
            code,
            name: byCode.get(code)!.name,
            opticalFraction,
            wtPct
          })),
          pumpLeakFraction: r.leak,
          loading: r.phosphors.some((p) => p[2] === null) ? null : { pathLengthMm: 0.3, basis: 'wtPctOfSlurry' as const },
          silicone: {
            siliconeSystemId: s.id,
            name: s.name,
            ratioA: Number(s.ratio_a),
            ratioB: Number(s.ratio_b),
            potLifeMin: s.pot_life_min,
            cure: s.cure,
            densityGPerCm3: Number(s.density_g_cm3)
          },
          target: { kind: 'cctDuv' as const, cct: f.cct, duv: 0 },
          tolerance: { kind: 'sdcm' as const, steps: 3 },
          floors: r.floors,
          notes: r.notes
        };
        const loaded = await loadRevisionComponents(trx, parseRecipe(raw));
        const predicted = predictRevision(loaded.content, loaded.components);
        const sha = contentSha256(loaded.content);
        const decided = r.state === 'approved' || r.state === 'superseded';
        const [revisionId] = await trx('formulation_revisions').insert({
          formulation_id: formulationId,
          revision_no: i + 1,
          state: 'draft',
          content_json: JSON.stringify(loaded.content),
          predicted_json: JSON.stringify(predicted),
          core_version: PREDICTION_CORE_VERSION,
          content_sha256: sha,
          created_by: author.id,
          created_at: new Date(r.createdAt),
          updated_at: new Date(r.createdAt),
          based_on_revision_id: previous
        });
        await audit(trx, author, 'formulation_revision', revisionId, 'create', r.createdAt, null, {
          formulationId,
          revisionNo: i + 1,
          state: 'draft',
          contentSha256: sha
        });
        // Walk the revision through the same transitions the app makes (the lock trigger checks each one).
        if (r.submittedAt) {
          await trx('formulation_revisions')
            .where({ id: revisionId })
            .update({
              state: 'submitted',
              submitted_at: new Date(r.submittedAt),
              submitted_by: author.id,
              version: 2,
              updated_at: new Date(r.submittedAt)
            });
          await audit(
            trx,
            author,
            'formulation_revision',
            revisionId,
            'submit',
            r.submittedAt,
            { state: 'draft', version: 1 },
            { state: 'submitted', version: 2, contentSha256: sha }
          );
        }
        if (decided) {
          const [sigId] = await trx('revision_signatures').insert({
            revision_id: revisionId,
            signer_id: quality.id,
            signer_name: quality.name,
            signer_email: quality.email,
            meaning: 'approved',
            comment: r.comment ?? null,
            signed_at: new Date(r.decidedAt!),
            content_sha256: sha
          });
          await audit(trx, quality, 'formulation_revision', revisionId, 'e-signature', r.decidedAt!, null, {
            signatureId: sigId,
            meaning: 'approved',
            contentSha256: sha
          });
          if (previous !== null) {
            await trx('formulation_revisions')
              .where({ id: previous })
              .update({ state: 'superseded', superseded_at: new Date(r.decidedAt!), version: 4, updated_at: new Date(r.decidedAt!) });
            await audit(
              trx,
              quality,
              'formulation_revision',
              previous,
              'supersede',
              r.decidedAt!,
              { state: 'approved', version: 3 },
              { state: 'superseded', version: 4, supersededByRevisionId: revisionId }
            );
          }
          await trx('formulation_revisions')
            .where({ id: revisionId })
            .update({
              state: 'approved',
              decided_at: new Date(r.decidedAt!),
              decided_by: quality.id,
              supersedes_revision_id: previous,
              version: 3,
              updated_at: new Date(r.decidedAt!)
            });
          await audit(
            trx,
            quality,
            'formulation_revision',
            revisionId,
            'approve',
            r.decidedAt!,
            { state: 'submitted', version: 2 },
            { state: 'approved', version: 3, supersedesRevisionId: previous, contentSha256: sha }
          );
        }
        console.log(
          `seed 03_formulations: ${f.code} rev ${i + 1} ${r.state}: ` +
            `${Math.round(predicted.cct)} K, Duv ${predicted.duv.toFixed(4)}, Ra ` +
            `${predicted.ra?.toFixed(1)}, R9 ${predicted.r9?.toFixed(1)}`
        );
        previous = revisionId;
      }
      const last = f.revisions
        .flatMap((r) => [r.createdAt, r.submittedAt, r.decidedAt])
        .filter((d): d is string => Boolean(d))
        .sort()
        .at(-1)!;
      await trx('formulations')
        .where({ id: formulationId })
        .update({ updated_at: new Date(last) });
    });
  }
}

async function audit(
  trx: Knex.Transaction,
  actor: { id: number; email: string },
  entityType: string,
  entityId: number,
  action: string,
  at: string,
  before: unknown,
  after: unknown
) {
  await trx('audit_events').insert({
    at: new Date(at),
    actor_id: actor.id,
    actor_email: actor.email,
    entity_type: entityType,
    entity_id: String(entityId),
    action,
    before_json: before === null ? null : JSON.stringify(before),
    after_json: JSON.stringify(after)
  });
}
