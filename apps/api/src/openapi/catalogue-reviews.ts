/** Catalogue entries for reviews, approvals, comments and captured mail. */
import {
  commentCreateSchema,
  commentEditSchema,
  commentListQuerySchema,
  commentListSchema,
  commentParamsSchema,
  commentResolveSchema,
  commentSchema,
  mailListQuerySchema,
  mailListSchema,
  missionParamsSchema,
  reviewApproveSchema,
  reviewListQuerySchema,
  reviewListSchema,
  reviewParamsSchema,
  reviewSchema,
  reviewSendBackSchema,
  reviewSubmitSchema,
} from '@photon-ledger/shared';
import type { RouteDoc } from './route-catalogue';

const one = '/missions/:missionId/reviews/:subjectType/:subjectId';

export const reviewRouteDocs: RouteDoc[] = [
  { method: 'get', path: '/missions/:missionId/reviews', summary: 'Reviews of the mission’s studies and budgets (subjects ever submitted)', tag: 'reviews', access: 'read', params: missionParamsSchema, query: reviewListQuerySchema, response: { status: 200, schema: reviewListSchema } },
  { method: 'get', path: one, summary: 'Review state of a study or a run’s budget (draft when never submitted), with the approved hash and whether the content still matches it', tag: 'reviews', access: 'read', params: reviewParamsSchema, response: { status: 200, schema: reviewSchema } },
  { method: 'post', path: `${one}/submit`, summary: 'Submit for review (from draft or changes requested; mails the mission’s leads)', tag: 'reviews', access: 'edit', params: reviewParamsSchema, body: reviewSubmitSchema, response: { status: 200, schema: reviewSchema } },
  { method: 'post', path: `${one}/approve`, summary: 'Approve (from in review): freezes the covered ids and their SHA-256 content hash; mails the submitter', tag: 'reviews', access: 'lead', params: reviewParamsSchema, body: reviewApproveSchema, response: { status: 200, schema: reviewSchema } },
  { method: 'post', path: `${one}/send-back`, summary: 'Send back with a required reason (from in review); mails the submitter', tag: 'reviews', access: 'lead', params: reviewParamsSchema, body: reviewSendBackSchema, response: { status: 200, schema: reviewSchema } },
  { method: 'get', path: '/missions/:missionId/comments', summary: 'Comments on a study, a case or a budget (optionally one line), oldest first', tag: 'comments', access: 'read', params: missionParamsSchema, query: commentListQuerySchema, response: { status: 200, schema: commentListSchema } },
  { method: 'post', path: '/missions/:missionId/comments', summary: 'Add a comment or a reply; @local-part or mentionUserIds mention mission members (mailed)', tag: 'comments', access: 'comment', params: missionParamsSchema, body: commentCreateSchema, response: { status: 201, schema: commentSchema } },
  { method: 'put', path: '/missions/:missionId/comments/:commentId', summary: 'Edit the text of your own comment (403 for anyone else’s)', tag: 'comments', access: 'comment', params: commentParamsSchema, body: commentEditSchema, response: { status: 200, schema: commentSchema } },
  { method: 'post', path: '/missions/:missionId/comments/:commentId/resolve', summary: 'Resolve or reopen a comment', tag: 'comments', access: 'comment', params: commentParamsSchema, body: commentResolveSchema, response: { status: 200, schema: commentSchema } },
  { method: 'get', path: '/admin/mail', summary: 'Messages received by the local capture SMTP server, newest first', tag: 'mail', access: 'admin', query: mailListQuerySchema, response: { status: 200, schema: mailListSchema } },
];
