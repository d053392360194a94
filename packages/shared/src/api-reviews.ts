import { z } from 'zod';

// Reviews and approvals, threaded comments, captured mail (routes in apps/api/src/routes/review-routes.ts,
// comment-routes.ts, mail-routes.ts).

const uuid = (field: string) => z.uuid({ message: `${field} must be a UUID` });

/** What can be reviewed: a trade study, or a run's budget (the subject id is then the run id). */
export const reviewSubjectTypes = ['study', 'budget'] as const;
export const reviewSubjectTypeSchema = z.enum(reviewSubjectTypes, { message: `subjectType must be one of ${reviewSubjectTypes.join(', ')}` });
export type ReviewSubjectType = z.infer<typeof reviewSubjectTypeSchema>;

/** Where a review stands. A subject never submitted is a draft. */
export const reviewStates = ['draft', 'in-review', 'approved', 'changes-requested'] as const;
export const reviewStateSchema = z.enum(reviewStates);
export type ReviewState = z.infer<typeof reviewStateSchema>;

/** What a caller asks of a review: the transitions. */
export const reviewActions = ['submit', 'approve', 'send-back'] as const;
export type ReviewAction = (typeof reviewActions)[number];

/** Path of the review routes of one subject. */
export const reviewParamsSchema = z.object({
  missionId: uuid('missionId'),
  subjectType: reviewSubjectTypeSchema,
  subjectId: uuid('subjectId'),
});
export type ReviewParams = z.infer<typeof reviewParamsSchema>;

/** Body of `POST .../submit` (an optional note for the leads). */
export const reviewSubmitSchema = z.object({ note: z.string().trim().max(2000, 'note must be at most 2000 characters').optional() });
export type ReviewSubmit = z.infer<typeof reviewSubmitSchema>;

/** Body of `POST .../approve`. */
export const reviewApproveSchema = z.object({ note: z.string().trim().max(2000, 'note must be at most 2000 characters').optional() });
export type ReviewApprove = z.infer<typeof reviewApproveSchema>;

/** Body of `POST .../send-back`: the reason is required. */
export const reviewSendBackSchema = z.object({
  reason: z.string({ message: 'reason is required' }).trim().min(3, 'reason is required (at least 3 characters)').max(2000, 'reason must be at most 2000 characters'),
});
export type ReviewSendBack = z.infer<typeof reviewSendBackSchema>;

/** What an approval froze: the ids it covers and the SHA-256 of their canonical JSON. */
export const reviewFrozenSchema = z.object({
  contentHash: z.string().regex(/^[0-9a-f]{64}$/),
  /** Ids of what the hash covers (run, scenario, vehicle revision; or study and its cases). */
  ids: z.record(z.string(), z.union([z.string(), z.array(z.string())])),
  frozenAt: z.iso.datetime(),
});
export type ReviewFrozen = z.infer<typeof reviewFrozenSchema>;

const personSchema = z.object({ id: z.uuid(), displayName: z.string(), email: z.string() }).nullable();

/** One subject's review. */
export const reviewSchema = z.object({
  id: z.uuid().nullable(),
  missionId: z.uuid(),
  subjectType: reviewSubjectTypeSchema,
  subjectId: z.uuid(),
  state: reviewStateSchema,
  submittedBy: personSchema,
  submittedAt: z.iso.datetime().nullable(),
  decidedBy: personSchema,
  decidedAt: z.iso.datetime().nullable(),
  /** The lead's reason when sent back; the submitter's or approver's note otherwise. */
  reason: z.string().nullable(),
  note: z.string().nullable(),
  frozen: reviewFrozenSchema.nullable(),
  /** For an approved subject: does its content still hash to what was approved? */
  intact: z.boolean().nullable(),
  updatedAt: z.iso.datetime().nullable(),
});
export type Review = z.infer<typeof reviewSchema>;

/** Query of `GET /missions/:missionId/reviews`. */
export const reviewListQuerySchema = z.object({
  subjectType: reviewSubjectTypeSchema.optional(),
  state: reviewStateSchema.optional(),
});
export type ReviewListQuery = z.infer<typeof reviewListQuerySchema>;

export const reviewListSchema = z.object({ reviews: z.array(reviewSchema) });
export type ReviewList = z.infer<typeof reviewListSchema>;

// ---- comments ----

/** What a comment is on: a study, one case of a study, or a budget (optionally one line of it). */
export const commentSubjectTypes = ['study', 'case', 'budget'] as const;
export const commentSubjectTypeSchema = z.enum(commentSubjectTypes, { message: `subjectType must be one of ${commentSubjectTypes.join(', ')}` });
export type CommentSubjectType = z.infer<typeof commentSubjectTypeSchema>;

export const COMMENT_MAX_LENGTH = 4000;

/** Body of `POST /missions/:missionId/comments`. Mentions: `@local-part` in the text and/or userIds. */
export const commentCreateSchema = z.object({
  subjectType: commentSubjectTypeSchema,
  subjectId: uuid('subjectId'),
  /** A budget line key (e.g. `srp.accel.max`), for a comment on one line. */
  lineKey: z.string().trim().min(1, 'lineKey must not be empty').max(64, 'lineKey must be at most 64 characters').regex(/^[a-z0-9_.-]+$/i, 'lineKey may hold letters, digits, dots, dashes and underscores').optional(),
  parentId: uuid('parentId').optional(),
  body: z.string({ message: 'body is required' }).trim().min(1, 'body must not be empty').max(COMMENT_MAX_LENGTH, `body must be at most ${COMMENT_MAX_LENGTH} characters`),
  mentionUserIds: z.array(uuid('mentionUserIds')).max(20, 'at most 20 mentions').optional(),
});
export type CommentCreate = z.infer<typeof commentCreateSchema>;

/** Query of `GET /missions/:missionId/comments`. */
export const commentListQuerySchema = z.object({
  subjectType: commentSubjectTypeSchema,
  subjectId: uuid('subjectId'),
  lineKey: z.string().max(64).optional(),
});
export type CommentListQuery = z.infer<typeof commentListQuerySchema>;

export const commentParamsSchema = z.object({ missionId: uuid('missionId'), commentId: uuid('commentId') });
export type CommentParams = z.infer<typeof commentParamsSchema>;

/** Body of `PUT .../comments/:commentId` (the author edits the text). */
export const commentEditSchema = z.object({
  body: z.string({ message: 'body is required' }).trim().min(1, 'body must not be empty').max(COMMENT_MAX_LENGTH, `body must be at most ${COMMENT_MAX_LENGTH} characters`),
});
export type CommentEdit = z.infer<typeof commentEditSchema>;

/** Body of `POST .../comments/:commentId/resolve`. */
export const commentResolveSchema = z.object({ resolved: z.boolean({ message: 'resolved must be true or false' }) });
export type CommentResolve = z.infer<typeof commentResolveSchema>;

export const commentSchema = z.object({
  id: z.uuid(),
  missionId: z.uuid(),
  subjectType: commentSubjectTypeSchema,
  subjectId: z.uuid(),
  lineKey: z.string().nullable(),
  parentId: z.uuid().nullable(),
  author: personSchema,
  body: z.string(),
  mentions: z.array(z.object({ id: z.uuid(), displayName: z.string(), email: z.string() })),
  resolved: z.boolean(),
  resolvedBy: personSchema,
  resolvedAt: z.iso.datetime().nullable(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type Comment = z.infer<typeof commentSchema>;

export const commentListSchema = z.object({ comments: z.array(commentSchema) });
export type CommentList = z.infer<typeof commentListSchema>;

// ---- captured mail ----

export const mailListQuerySchema = z.object({
  limit: z.coerce.number({ message: 'limit must be a number' }).int('limit must be a whole number').min(1, 'limit must be at least 1').max(500, 'limit must be at most 500').default(100),
});
export type MailListQuery = z.infer<typeof mailListQuerySchema>;

export const mailMessageSchema = z.object({
  id: z.string(),
  to: z.array(z.string()),
  from: z.string(),
  subject: z.string(),
  text: z.string(),
  receivedAt: z.iso.datetime(),
});
export type MailMessage = z.infer<typeof mailMessageSchema>;

export const mailListSchema = z.object({ messages: z.array(mailMessageSchema) });
export type MailList = z.infer<typeof mailListSchema>;

/** Payload of the `send-mail` job. */
export const sendMailJobSchema = z.object({
  to: z.array(z.email()).min(1),
  subject: z.string().min(1).max(300),
  text: z.string().max(20_000),
});
export type SendMailJob = z.infer<typeof sendMailJobSchema>;
