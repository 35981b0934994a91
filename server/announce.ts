/** Exit code of a server process that cannot listen (port taken): the primary does not start it again. */
export const EXIT_CANNOT_LISTEN = 3;

/** What `npm start` prints once the server answers. */
export function announce(port: number, workers: number, env = process.env): void {
  const url = `http://localhost:${port}`;
  console.log(`\n[bungwise] Bungwise is running at ${url}${workers > 1 ? ` (${workers} server processes)` : ''}`);
  if (env.BUNGWISE_DEMO !== '0') {
    console.log('[bungwise] Demo sign-ins (password bungwise-demo):');
    for (const role of ['clerk', 'engineer', 'engineer2', 'buyer', 'admin']) console.log(`[bungwise]   ${role.padEnd(9)} ${role}@bungwise.example`);
  }
  if (env.BUNGWISE_MAIL_WEB_URL) console.log(`[bungwise] Outgoing mail (local inbox): ${env.BUNGWISE_MAIL_WEB_URL}`);
  if (!env.S3_BUCKET) console.log('[bungwise] File storage is off: set S3_BUCKET to keep attachments and imported files.');
  if (!env.SMTP_URL) console.log('[bungwise] E-mail is off: set SMTP_URL to send notices by mail.');
  console.log('[bungwise] Press Ctrl-C to stop.\n');
}
