/** What every channel sender returns and throws, so the dispatcher treats mail and text alike. */

export interface SendResult {
  /** The provider's id for the message (SMTP Message-ID, or the text provider's message sid). */
  providerMessageId: string;
}

/** A failed send, marked retryable (try again later) or permanent (trying again cannot help). */
export class SendError extends Error {
  constructor(
    message: string,
    readonly retryable: boolean,
  ) {
    super(message);
  }
}

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
  attachments: Array<{ filename: string; content: Buffer; contentType: string; cid?: string }>;
  /** Stable per notification, so a resend carries the same Message-ID. */
  messageId: string;
  triggerIds: number[];
}

export interface OutgoingSms {
  to: string;
  body: string;
  idempotencyKey: string;
  triggerIds: number[];
}

export interface MailSender {
  readonly kind: "fake" | "smtp";
  send(mail: OutgoingMail): Promise<SendResult>;
  close(): Promise<void>;
}

export interface SmsSender {
  readonly kind: "fake" | "provider";
  send(sms: OutgoingSms): Promise<SendResult>;
  close(): Promise<void>;
}
