/** What the API accepts on a booking: at most this many files of at most this many bytes, of these kinds. */
export const attachmentLimits = {
  files: 5,
  fileSize: 20 * 1024 * 1024,
  extensions: ['pdf', 'png', 'jpg', 'jpeg', 'dwg', 'dxf'],
} as const;

/** The `accept` attribute of the file picker. */
export const attachmentAccept = attachmentLimits.extensions.map((extension) => `.${extension}`).join(',');

/** Files that may be attached, and why the others may not. */
export interface AttachmentChoice {
  readonly accepted: File[];
  readonly refusals: string[];
}

function extensionOf(name: string): string {
  const dot = name.lastIndexOf('.');
  return dot < 0 ? '' : name.slice(dot + 1).toLowerCase();
}

/**
 * Splits newly chosen files into those the API will take and plain reasons for the rest, given how many are already
 * on the list.
 */
export function chooseAttachments(files: readonly File[], alreadyChosen: number): AttachmentChoice {
  const accepted: File[] = [];
  const refusals: string[] = [];
  for (const file of files) {
    if (!(attachmentLimits.extensions as readonly string[]).includes(extensionOf(file.name))) {
      refusals.push(`${file.name}: only PDF, PNG, JPEG, DWG and DXF files are accepted.`);
    } else if (file.size === 0) {
      refusals.push(`${file.name} is empty.`);
    } else if (file.size > attachmentLimits.fileSize) {
      refusals.push(`${file.name} is larger than ${attachmentLimits.fileSize / 1024 / 1024} MB.`);
    } else if (alreadyChosen + accepted.length >= attachmentLimits.files) {
      refusals.push(`${file.name} was left out: attach at most ${attachmentLimits.files} files.`);
    } else {
      accepted.push(file);
    }
  }
  return { accepted, refusals };
}
