import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { Preview, SavedImportProfile } from '@tunnelwright/contracts';
import type { Observable } from 'rxjs';
import type { ImportProfileJson } from './profile-json';

/** What is saved with a profile: its name and description, the profile, and the sample it must read cleanly. */
export interface ProfileSubmission {
  readonly name: string;
  readonly description: string;
  readonly profile: ImportProfileJson;
  readonly sample: File;
}

/** Calls for the lab's import profiles and for trying one on a sample file. */
@Injectable({ providedIn: 'root' })
export class ImportProfilesApi {
  private readonly http = inject(HttpClient);

  /** The saved profiles by name; archived ones only when asked. */
  list(includeArchived: boolean): Observable<SavedImportProfile[]> {
    return this.http.get<SavedImportProfile[]>('/api/import-profiles', { params: includeArchived ? { archived: 'true' } : {} });
  }

  /** Reads a sample file through a profile that is not saved yet; nothing is kept. */
  tryOnSample(sample: File, profile: ImportProfileJson): Observable<Preview> {
    const form = new FormData();
    form.append('profile', JSON.stringify(profile));
    form.append('file', sample, sample.name);
    return this.http.post<Preview>('/api/runs/preview', form);
  }

  create(submission: ProfileSubmission): Observable<SavedImportProfile> {
    return this.http.post<SavedImportProfile>('/api/import-profiles', submissionForm(submission));
  }

  /** Replaces the whole profile; the sample must read cleanly again. */
  update(id: string, submission: ProfileSubmission): Observable<SavedImportProfile> {
    return this.http.put<SavedImportProfile>(`/api/import-profiles/${id}`, submissionForm(submission));
  }

  archive(id: string): Observable<SavedImportProfile> {
    return this.http.post<SavedImportProfile>(`/api/import-profiles/${id}/archive`, {});
  }
}

function submissionForm(submission: ProfileSubmission): FormData {
  const form = new FormData();
  form.append('name', submission.name);
  form.append('description', submission.description);
  form.append('profile', JSON.stringify(submission.profile));
  form.append('file', submission.sample, submission.sample.name);
  return form;
}
