/** Reading people and open invitations for the account pages. */
import * as users from './users';
import * as invites from './invites';
import { mayActOnRevisions } from '../../access/policies';

export type { User } from './users';
export type { Invite } from './invites';

export const listPeople = (): Promise<users.User[]> => users.list();
export const listOpenInvites = (): Promise<invites.Invite[]> => invites.listOpen();
export const findOpenInvite = (token: string): Promise<invites.Invite | null> => invites.findOpen(token);

/** People who may author revisions (everyone but technicians), as filter choices. */
export async function authorChoices(): Promise<{ id: number; name: string }[]> {
  return (await users.list()).filter((u) => mayActOnRevisions(u)).map((u) => ({ id: u.id, name: u.name }));
}
