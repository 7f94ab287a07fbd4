/**
 * Asks the outbox sender to deliver pending messages soon, without waiting for its next tick.
 * The sender registers itself here when it starts (lib/mail/sender.ts); before that this is a no-op.
 */
const globalForKick = globalThis as unknown as { __roostwrightKickMail?: () => void };

export function kickMailSender(): void {
  globalForKick.__roostwrightKickMail?.();
}

export function registerMailKick(fn: () => void): void {
  globalForKick.__roostwrightKickMail = fn;
}
