import { z } from 'zod';
import { PersonRow } from './users';
import { get, queryString } from './http';

const VolunteersResponse = z.object({ users: z.array(PersonRow) });

/** Coordinators and admins: the read-only list of people, with whether each has verified their e-mail. */
export async function listVolunteers(q?: string): Promise<PersonRow[]> {
  return (await get(`/api/volunteers${queryString({ q })}`, VolunteersResponse)).users;
}
