/** Shared set-up of the formulation tests: demo people, demo materials, a valid content, the mail catcher. */
import { db } from '../../../src/lib/server/db/index';
import * as users from '../../../src/lib/server/accounts/users';
import type { User } from '../../../src/lib/server/accounts/users';
import type { RevisionContent } from '../../../src/lib/recipe';
import { ensureDemoMaterials } from '../../support/demo-materials';
import type { CaughtMail } from '../../support/mail';

export { caughtMail, type CaughtMail } from '../../support/mail';

export const DEMO_PASSWORD = 'phosforge-demo';

export interface Cast {
  rhea: User;
  jonah: User;
  ines: User;
  tomas: User;
  admin: User;
}

export async function cast(): Promise<Cast> {
  const get = async (handle: string) => {
    const u = await users.findWithHashByEmail(`${handle}@kestrelhollow.example`);
    if (!u) throw new Error(`demo user ${handle} missing: run the demo seed`);
    return (await users.get(u.id))!;
  };
  return {
    rhea: await get('rhea.okafor'),
    jonah: await get('jonah.pell'),
    ines: await get('ines.halloran'),
    tomas: await get('tomas.brand'),
    admin: await get('admin')
  };
}

let materialIds: Map<string, number> | undefined;

/** A valid 3000 K content (fractions from the blend solver for B-450 + GL-530 + YL-568 + RD-625). */
export async function warmWhite(overrides: Partial<RevisionContent> = {}): Promise<RevisionContent> {
  materialIds ??= await ensureDemoMaterials(db());
  const m = (code: string) => ({ materialId: materialIds!.get(code)!, code, name: code });
  return {
    contentVersion: 1,
    pump: m('B-450'),
    phosphors: [
      { ...m('GL-530'), opticalFraction: 0.2667, wtPct: 9.32 },
      { ...m('YL-568'), opticalFraction: 0.2346, wtPct: 7.14 },
      { ...m('RD-625'), opticalFraction: 0.4287, wtPct: 8.29 }
    ],
    pumpLeakFraction: 0.07,
    loading: { pathLengthMm: 0.3, basis: 'wtPctOfSlurry' },
    silicone: {
      siliconeSystemId: null,
      name: 'Test 1:1 encapsulant',
      ratioA: 1,
      ratioB: 1,
      potLifeMin: 240,
      cure: '1 h at 80 °C, 2 h at 150 °C',
      densityGPerCm3: 1.1
    },
    target: { kind: 'cctDuv', cct: 3000, duv: 0 },
    tolerance: { kind: 'sdcm', steps: 3 },
    floors: { raMin: 90, r9Min: 50 },
    notes: '',
    ...overrides
  };
}

/** A formulation code no earlier run used. */
export function uniqueCode(prefix = 'T'): string {
  return `${prefix}-${Date.now().toString(36).toUpperCase()}${Math.floor(Math.random() * 1296)
    .toString(36)
    .toUpperCase()}`;
}

export const recipients = (mails: CaughtMail[]) => mails.flatMap((m) => m.to.map((t) => t.address)).sort();

/** Audit rows of one revision, oldest first. */
export async function auditOf(entityType: string, entityId: number) {
  return db()('audit_events')
    .where({ entity_type: entityType, entity_id: String(entityId) })
    .orderBy('id');
}
