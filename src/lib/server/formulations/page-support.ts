/** Helpers of the formulation pages: editor choices, form → content. */
import { listMaterialOptions } from '../library/components';
import { formValuesToRaw, type FormValues } from '../../formulations/form-values';
import { ValidationError } from './errors';
import { listSiliconeSystems } from './silicone';

export async function editorOptions() {
  const [pumps, phosphors, silicones] = await Promise.all([
    listMaterialOptions('pump'),
    listMaterialOptions('phosphor'),
    listSiliconeSystems()
  ]);
  return { pumps, phosphors, silicones };
}

/** The raw content from the draft form; the selects that must be chosen are checked here with plain messages. */
export function contentFromForm(values: FormValues): unknown {
  const missing = [
    !values.pumpId && 'pump: choose a pump',
    ![0, 1, 2, 3, 4].some((i) => values[`ph${i}`]) && 'phosphors: choose at least one phosphor',
    !values.siliconeId && 'silicone: choose a silicone system'
  ].filter((m): m is string => Boolean(m));
  if (missing.length)
    throw new ValidationError(
      missing.join('; '),
      missing.map((m) => ({ path: m.split(':')[0], message: m }))
    );
  return formValuesToRaw(values);
}
