import { importProfileSchema, type ImportProfile as ProfileRules } from '@tunnelwright/aero';
import type { SavedImportProfile } from '@tunnelwright/contracts';
import { ImportProfile } from '@tunnelwright/db';
import { HttpError } from '../errors/http-error';

/**
 * Parses the multipart `profile` field, JSON of an import profile, into the validated profile.
 * @throws HttpError 400 naming each invalid field as `profile.<path>`
 */
export function parseProfileField(json: string): ProfileRules {
  let value: unknown;
  try {
    value = JSON.parse(json);
  } catch {
    throw HttpError.field('profile', 'The import profile must be JSON');
  }
  const result = importProfileSchema.safeParse(value);
  if (result.success) return result.data;
  const errors = result.error.issues.map((i) => ({ field: ['profile', ...i.path.map(String)].join('.'), message: i.message }));
  throw new HttpError(400, 'Some fields need attention', `The import profile is not valid: ${errors.map((e) => `${e.field}: ${e.message}`).join('; ')}`, errors);
}

/** What an upload or preview records of the saved profile it was read through. */
export interface UsedImportProfile {
  id: string;
  name: string;
  profile: ProfileRules;
}

/**
 * Loads a saved, unarchived import profile for an upload or a preview.
 * @throws HttpError 400 on the `profileId` field when there is no such usable profile
 */
export async function usableImportProfile(profileId: string): Promise<UsedImportProfile> {
  const saved = await ImportProfile.query().findById(profileId);
  if (!saved || saved.archived) throw HttpError.field('profileId', 'Choose a saved import profile that is not archived');
  return { id: saved.id, name: saved.name, profile: importProfileSchema.parse(saved.profile) };
}

export function toSavedImportProfile(p: ImportProfile): SavedImportProfile {
  return {
    id: p.id,
    name: p.name,
    description: p.description,
    profile: p.profile,
    createdBy: p.createdBy,
    archived: p.archived,
    createdAt: p.createdAt.toISOString(),
    updatedAt: p.updatedAt.toISOString(),
  };
}
