/**
 * The body of a page form action. A body that cannot be read as a form (a multipart body cut off,
 * without its boundary, or not form data at all) is answered 400 with a plain message instead of an
 * exception (500); nothing has been saved at that point.
 */
import { error } from '@sveltejs/kit';

export const UNREADABLE_FORM =
  'The form could not be read (the upload was cut off, or the body is not form data). Nothing was saved; send it again.';

export async function readForm(request: Request): Promise<FormData> {
  try {
    return await request.formData();
  } catch {
    error(400, UNREADABLE_FORM);
  }
}
