import type { Response } from 'express';
import { reply } from '@/server/http/reply';
import type { Result } from '@/server/services/result';

/** A file answer: the body with its type and an attachment name; a failed result answers as JSON like any other. */
export type FileBody = { fileName: string; contentType: string; body: string | Buffer };

export function replyFile(res: Response, result: Result<FileBody>): void {
  if (!result.ok) {
    reply(res, result, 200);
    return;
  }
  const { fileName, contentType, body } = result.value;
  res.status(200).type(contentType).attachment(fileName).setHeader('Cache-Control', 'private, no-store');
  res.send(body);
}
