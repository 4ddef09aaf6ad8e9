import { getMailList, getMailMessage } from '../controllers/mail.controller';
import { ApiRouter } from '../http/api-router';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';

/** Mail caught by the development SMTP sink (empty when the server sends through a real SMTP host). */
export function mailRoutes(): ApiRouter {
  return new ApiRouter('mail')
    .get('/admin/mail', 'Captured mail, newest first (?to=, ?limit=)', authenticate, requireRight('mail:read'), getMailList)
    .get('/admin/mail/:id', 'One captured message with its headers', authenticate, requireRight('mail:read'), getMailMessage);
}
