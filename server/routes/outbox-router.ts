import { Router } from 'express';
import { Not, type DataSource } from 'typeorm';
import type { OutboxMailView } from '../../shared/outbox-mail-view';
import { OutboxMail } from '../entities/outbox-mail';
import { idParams } from '../../shared/schemas/id-params';
import { outboxListQuery } from '../../shared/schemas/outbox-list-query';
import type { ReceivedMailView } from '../../shared/received-mail-view';
import { ReceivedMail } from '../entities/received-mail';
import { HttpError } from '../http/http-error';
import { declareRoute } from '../http/declare-route';

const summary = (m: ReceivedMail): ReceivedMailView => ({
  id: m.id,
  from: m.envelopeFrom,
  to: m.envelopeTo,
  subject: m.subject,
  receivedAt: m.receivedAt.toISOString(),
});

/** Mail not yet delivered shows at most this many, newest first: a relay down for a day queues a few dozen. */
const QUEUE_PAGE = 100;

/** What the local mail server received (admins): a page of messages, and one message rendered; and the mail not yet delivered. */
export function outboxRouter(dataSource: DataSource): Router {
  const router = Router();
  const mails = dataSource.getRepository(ReceivedMail);
  const queued = dataSource.getRepository(OutboxMail);

  declareRoute(
    router,
    'get',
    '/',
    {
      summary: 'A page of the mail the local mail server received, newest first',
      access: ['admin'],
      query: outboxListQuery,
      responses: {
        200: 'The messages (`messages`) and the id to ask `before` for the next page (`next`, null at the end).',
      },
    },
    async (_req, res, { query: { limit, before } }) => {
      const rows: ReceivedMail[] = await mails
        .createQueryBuilder('m')
        .where(
          before ? '(m.received_at, m.id) < (SELECT received_at, id FROM received_mail WHERE id = :before)' : 'true',
          { before },
        )
        .orderBy('m.received_at', 'DESC')
        .addOrderBy('m.id', 'DESC')
        .limit(limit)
        .getMany();
      res.json({ messages: rows.map(summary), next: rows.length === limit ? rows[rows.length - 1]!.id : null });
    },
  );

  /** Mail not (or not surely) delivered: waiting, being sent, unconfirmed or failed, newest first. */
  declareRoute(
    router,
    'get',
    '/queue',
    {
      summary: 'Mail not (or not surely) delivered: waiting, being sent, unconfirmed or failed',
      access: ['admin'],
      responses: { 200: 'The mails (`mails`), newest first, at most 100.' },
    },
    async (_req, res) => {
      const rows: OutboxMail[] = await queued.find({
        where: { status: Not('sent') },
        order: { createdAt: 'DESC', id: 'DESC' },
        take: QUEUE_PAGE,
      });
      res.json({
        mails: rows.map((m): OutboxMailView => ({
          id: m.id,
          kind: m.kind,
          subject: m.subject,
          recipients: m.recipients,
          status: m.status,
          attempts: m.attempts,
          lastError: m.lastError,
          nextAttemptAt: m.nextAttemptAt.toISOString(),
          createdAt: m.createdAt.toISOString(),
        })),
      });
    },
  );

  declareRoute(
    router,
    'get',
    '/:id',
    {
      summary: 'One received message, with its text and HTML',
      access: ['admin'],
      params: idParams,
      responses: { 200: 'The message (`message`).', 404: 'No message with that id.' },
    },
    async (_req, res, { params: { id } }) => {
      const mail = await mails.findOneBy({ id });
      if (!mail) throw new HttpError(404, { kind: 'not-found', message: 'No message with that id.' });
      res.json({ message: { ...summary(mail), text: mail.textBody, html: mail.htmlBody } satisfies ReceivedMailView });
    },
  );

  return router;
}
