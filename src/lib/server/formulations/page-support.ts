/** Helpers of the formulation pages: editor choices, form → content, service refusals → form errors. */
import { fail } from '@sveltejs/kit';
import { db } from '../db/index';
import { formValuesToRaw, type FormValues } from '../../formulations/form-values';
import { FormulationError, ValidationError } from './errors';
import { listSiliconeSystems } from './silicone';

export interface EditorOption {
  id: number;
  code: string;
  name: string;
}

async function materialOptions(kind: 'pump' | 'phosphor'): Promise<EditorOption[]> {
  return db()('materials').where({ kind }).whereNull('archived_at').orderBy('code').select('id', 'code', 'name');
}

export async function editorOptions() {
  const [pumps, phosphors, silicones] = await Promise.all([materialOptions('pump'), materialOptions('phosphor'), listSiliconeSystems()]);
  return { pumps, phosphors, silicones };
}

/** The raw content from the draft form; the selects that must be chosen are checked here with plain messages. */
export function contentFromForm(values: FormValues): unknown {
  const missing = [
    !values.pumpId && 'pump: choose a pump',
    ![0, 1, 2, 3, 4].some((i) => values[`ph${i}`]) && 'phosphors: choose at least one phosphor',
    !values.siliconeId && 'silicone: choose a silicone system'
  ].filter((m): m is string => Boolean(m));
  if (missing.length) throw new ValidationError(missing.join('; '), missing.map((m) => ({ path: m.split(':')[0], message: m })));
  return formValuesToRaw(values);
}

/** A refused save or command as a form failure that carries the person's input back to the page. */
export function formRefusal(err: unknown, values: FormValues = {}, action = '') {
  if (!(err instanceof FormulationError)) throw err;
  const { password: _password, ...kept } = values;
  return fail(err.status, {
    action,
    values: kept,
    error: err.message,
    issues: err instanceof ValidationError ? err.issues : [],
    conflict: err.status === 409
  });
}
