/**
 * Files a blend from the designer as a formulation draft: a new formulation, or a new revision of
 * an existing one. The silicone system and the material codes come from the database, never from
 * the browser; the formulations services validate the content, predict, save in one transaction
 * and write the audit trail.
 */
import * as materials from '../library/records';
import { listSiliconeSystems } from '../formulations/silicone';
import { createFormulationWithDraft, createRevision, ValidationError } from '../formulations/save';
import type { Caller } from '../formulations/guard';
import { revisionContentFrom, type FilingForm } from '../../designer/filing';
import type { MaterialRef, SiliconeSpec } from '../../recipe';

export interface FiledBlend {
  formulationId: number;
  revisionId: number;
  revisionNo: number;
  code: string | null;
}

async function refOf(id: number, kind: materials.MaterialKind, slot: string): Promise<MaterialRef> {
  const m = await materials.get(id);
  if (!m || m.kind !== kind)
    throw new ValidationError(`${slot}: material ${id} is not a ${kind} in the library`, [{ path: slot, message: `not a ${kind}` }]);
  return { materialId: m.id, code: m.code, name: m.name };
}

async function siliconeOf(id: number): Promise<SiliconeSpec> {
  const s = (await listSiliconeSystems()).find((row) => row.id === id);
  if (!s)
    throw new ValidationError('pick a silicone system from the list', [{ path: 'siliconeSystemId', message: 'unknown silicone system' }]);
  return {
    siliconeSystemId: s.id,
    name: s.name,
    ratioA: s.ratioA,
    ratioB: s.ratioB,
    potLifeMin: s.potLifeMin,
    cure: s.cure,
    densityGPerCm3: s.densityGPerCm3
  };
}

export async function fileBlend(caller: Caller, form: FilingForm): Promise<FiledBlend> {
  const { blend } = form;
  const refs = {
    pump: await refOf(blend.pumpId, 'pump', 'pump'),
    phosphors: await Promise.all(blend.phosphorIds.map((id, i) => refOf(id, 'phosphor', `phosphors.${i}`)))
  };
  const content = revisionContentFrom(blend, refs, await siliconeOf(form.siliconeSystemId), form.notes);
  if (form.mode === 'new') {
    const made = await createFormulationWithDraft(caller, { code: form.code, name: form.name, content });
    return { formulationId: made.formulationId, revisionId: made.revisionId, revisionNo: made.revisionNo, code: made.code };
  }
  const made = await createRevision(caller, form.formulationId, content, form.basedOnRevisionId ?? null);
  return { formulationId: form.formulationId, revisionId: made.revisionId, revisionNo: made.revisionNo, code: null };
}
