// smtp-server on 127.0.0.1 capturing every message; stop() and start() keep the port, so a test
// can take "the mail relay" down and bring it back.
import type { Server } from 'node:net';
import { SMTPServer } from 'smtp-server';

export interface SmtpCapture {
  port: number;
  mails: { to: string[]; raw: string }[];
  start(): Promise<void>;
  stop(): Promise<void>;
}

export async function startSmtpCapture(): Promise<SmtpCapture> {
  const mails: SmtpCapture['mails'] = [];
  let port = 0;
  let server: InstanceType<typeof SMTPServer> | undefined;
  const start = async () => {
    server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      onData(stream, session, cb) {
        const chunks: Buffer[] = [];
        stream.on('data', (c: Buffer) => chunks.push(c));
        stream.on('end', () => {
          const to = (session.envelope.rcptTo || []).map((r) => r.address);
          mails.push({
            to,
            raw: Buffer.concat(chunks)
              .toString('utf8')
              .replace(/=\r?\n/g, ''),
          });
          cb();
        });
      },
    });
    await new Promise<void>((resolve, reject) => {
      (server as unknown as { server: Server }).server.once('error', reject);
      server!.listen(port, '127.0.0.1', () => resolve());
    });
    port = ((server as unknown as { server: Server }).server.address() as { port: number }).port;
  };
  await start();
  return {
    get port() {
      return port;
    },
    mails,
    start,
    stop: () => new Promise<void>((resolve) => server!.close(() => resolve())),
  };
}
