import { z } from 'zod';
import { testCalibrationStateSchema, testSchema } from './ingest';

/**
 * Review, approval and issue of certified result sheets, and their public verification.
 * Times are ISO 8601 UTC; issue dates are calendar dates (`YYYY-MM-DD`) in the laboratory's time zone.
 */

const reason = (what: string) =>
  z
    .string({ message: `Write ${what}` })
    .trim()
    .min(10, { message: `Write ${what} of at least 10 characters` })
    .max(2000, { message: `Keep ${what} under 2000 characters` });

/** A submission is awaiting approval, was sent back with a reason, or was approved (which freezes its data). */
export const submissionStateSchema = z.enum(['awaiting_approval', 'sent_back', 'approved']);
export type SubmissionState = z.infer<typeof submissionStateSchema>;

/** An issued sheet is valid until a later revision supersedes it. */
export const resultSheetStateSchema = z.enum(['valid', 'superseded']);
export type ResultSheetState = z.infer<typeof resultSheetStateSchema>;

/** POST /api/tests/:id/submissions: the reductions chosen for approval, one per run. */
export const submissionInputSchema = z.object({
  reductionIds: z
    .array(z.uuid({ message: 'Each chosen reduction must be an id' }), { message: 'Choose the reductions to submit' })
    .min(1, { message: 'Choose at least one reduction' })
    .max(200, { message: 'At most 200 reductions in one submission' }),
  note: z.string().trim().max(2000, { message: 'Keep the note under 2000 characters' }).default(''),
});
export type SubmissionInput = z.infer<typeof submissionInputSchema>;

/** POST /api/submissions/:id/approve. */
export const approvalInputSchema = z.object({
  comment: z.string().trim().max(2000, { message: 'Keep the comment under 2000 characters' }).default(''),
});
export type ApprovalInput = z.infer<typeof approvalInputSchema>;

/** POST /api/submissions/:id/send-back. */
export const sendBackInputSchema = z.object({ reason: reason('the reason for sending it back') });
export type SendBackInput = z.infer<typeof sendBackInputSchema>;

/** POST /api/submissions/:id/issue; a revision (a test that already has a valid sheet) needs its reason. */
export const issueInputSchema = z.object({
  revisionReason: z.string().trim().max(1000, { message: 'Keep the revision reason under 1000 characters' }).default(''),
});
export type IssueInput = z.infer<typeof issueInputSchema>;

/** PUT /api/reductions/:id/points/:index/exclusion. */
export const exclusionInputSchema = z.object({ reason: reason('why the point is left out') });
export type ExclusionInput = z.infer<typeof exclusionInputSchema>;

/** POST /api/signing-rights. */
export const signingRightInputSchema = z.object({
  userId: z.uuid({ message: 'Choose the person' }),
  scopeNote: z.string().trim().max(500, { message: 'Keep the note under 500 characters' }).default(''),
});
export type SigningRightInput = z.infer<typeof signingRightInputSchema>;

/** POST /api/signing-rights/:id/revoke. */
export const revokeSigningRightInputSchema = z.object({ reason: reason('why the right is removed') });
export type RevokeSigningRightInput = z.infer<typeof revokeSigningRightInputSchema>;

const personSchema = z.object({ id: z.uuid(), name: z.string() });

export const signingRightSchema = z.object({
  id: z.uuid(),
  user: personSchema.extend({ email: z.string(), role: z.string() }),
  grantedBy: personSchema,
  grantedAt: z.iso.datetime(),
  scopeNote: z.string(),
  revokedAt: z.iso.datetime().nullable(),
  revokedBy: personSchema.nullable(),
  revokedReason: z.string().nullable(),
});
export type SigningRight = z.infer<typeof signingRightSchema>;

export const pointExclusionSchema = z.object({
  id: z.uuid(),
  reductionId: z.uuid(),
  pointIndex: z.number().int(),
  pointNumber: z.number().int(),
  reason: z.string(),
  excludedBy: personSchema,
  createdAt: z.iso.datetime(),
});
export type PointExclusion = z.infer<typeof pointExclusionSchema>;

export const submissionSchema = z.object({
  id: z.uuid(),
  testId: z.uuid(),
  sequence: z.number().int(),
  state: submissionStateSchema,
  note: z.string(),
  submittedBy: personSchema,
  submittedAt: z.iso.datetime(),
  decidedBy: personSchema.nullable(),
  decidedAt: z.iso.datetime().nullable(),
  decisionReason: z.string().nullable(),
  reductions: z.array(
    z.object({
      reductionId: z.uuid(),
      runId: z.uuid(),
      runNumber: z.number().int(),
      runKind: z.string(),
      configurationLabel: z.string(),
      version: z.number().int(),
      /** Everyone who uploaded the raw file reduced; none of them may approve (four-eyes). */
      uploadedBy: personSchema,
      excludedPoints: z.number().int(),
    }),
  ),
  /** The sheet issued from this submission, once issued. */
  sheet: z.object({ id: z.uuid(), reportNumber: z.string(), state: resultSheetStateSchema }).nullable(),
});
export type Submission = z.infer<typeof submissionSchema>;

const sheetRefSchema = z.object({ id: z.uuid(), reportNumber: z.string(), issueDate: z.string() });

export const resultSheetSchema = z.object({
  id: z.uuid(),
  testId: z.uuid(),
  testTitle: z.string(),
  organisationId: z.uuid(),
  organisationName: z.string(),
  series: z.string(),
  revision: z.number().int(),
  reportNumber: z.string(),
  state: resultSheetStateSchema,
  issueDate: z.string(),
  issuedAt: z.iso.datetime(),
  sha256: z.string(),
  size: z.number().int(),
  pageCount: z.number().int(),
  revisionReason: z.string().nullable(),
  supersedes: sheetRefSchema.nullable(),
  supersededBy: sheetRefSchema.nullable(),
  authorisedBy: z.object({ name: z.string(), role: z.string() }),
  /** Public page anyone holding the sheet can check it on. */
  verificationUrl: z.string(),
  caution: z.string(),
});
export type ResultSheet = z.infer<typeof resultSheetSchema>;

export const resultSheetListQuerySchema = z.object({ testId: z.uuid({ message: 'testId must be a test id' }).optional() });

/** What the public verification page shows, and nothing more. */
export const verificationSchema = z.object({
  reportNumber: z.string(),
  issueDate: z.string(),
  state: resultSheetStateSchema,
  successor: z.object({ reportNumber: z.string(), issueDate: z.string() }).nullable(),
  sha256: z.string(),
});
export type Verification = z.infer<typeof verificationSchema>;

/** The answer to a dropped file: whether its bytes are exactly the issued sheet's. */
export const verificationCheckSchema = verificationSchema.extend({
  matches: z.boolean(),
  fileSha256: z.string(),
  fileSize: z.number().int(),
});
export type VerificationCheck = z.infer<typeof verificationCheckSchema>;

/** Where a customer's test stands, in the words the customer portal uses. */
export const customerTestStageSchema = z.enum(['booked', 'in_test', 'being_checked', 'certified']);
export type CustomerTestStage = z.infer<typeof customerTestStageSchema>;

/** Where a test stands on its way to a certified sheet, for the test lists and pages. */
export const testProgressSchema = z.object({
  customerStage: customerTestStageSchema,
  approval: z.object({
    state: z.enum(['none', 'awaiting_approval', 'sent_back', 'approved', 'issued']),
    submissionId: z.uuid().nullable(),
    /** The test's valid sheet, once one is issued. */
    sheetId: z.uuid().nullable(),
    reportNumber: z.string().nullable(),
  }),
});
export type TestProgress = z.infer<typeof testProgressSchema>;

/** GET /api/tests and GET /api/tests/:id: the test with where it stands. */
export const testWithProgressSchema = testSchema.extend({ progress: testProgressSchema });
export type TestWithProgress = z.infer<typeof testWithProgressSchema>;

/** GET /api/tests/:id: the test with where it stands and, for staff (null when the test names no balance), its calibration state. */
export const testDetailSchema = testWithProgressSchema.extend({ calibration: testCalibrationStateSchema.nullable().optional() });
export type TestDetail = z.infer<typeof testDetailSchema>;
