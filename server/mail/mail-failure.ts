/** Why a send failed, as one short sentence for the Mail outbox (never a stack trace). */
export function failureSentence(error: unknown): string {
  const { code, message, responseCode } = (error ?? {}) as { code?: string; message?: string; responseCode?: number };
  const detail = (message ?? String(error)).split('\n')[0]!.trim().slice(0, 200);
  // nodemailer reports a refused connection as a socket error whose message names ECONNREFUSED.
  if (/ECONNREFUSED/.test(detail)) return `The mail service did not answer (${detail}). Check SMTP_URL and that the mail service is running.`;
  switch (code) {
    case 'ECONNREFUSED':
    case 'ECONNECTION':
      return `The mail service did not answer (${detail}). Check SMTP_URL and that the mail service is running.`;
    case 'ETIMEDOUT':
      return 'The mail service took too long to answer. It will be tried again.';
    case 'EDNS':
      return 'The mail service\'s host name could not be found. Check SMTP_URL.';
    case 'EAUTH':
      return 'The mail service refused the sign-in. Check the user and password in SMTP_URL.';
    case 'EENVELOPE':
      return `The mail service refused the address (${detail}). Check the recipient's e-mail.`;
    default:
      return responseCode ? `The mail service refused the message with code ${responseCode} (${detail}).` : `The message could not be sent (${detail}).`;
  }
}
