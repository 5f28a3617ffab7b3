import { spawn, type ChildProcess } from 'node:child_process';
import { createConnection } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export interface EmbeddedMaildev {
  inboxUrl: string;
  stop(): Promise<void>;
}

function waitForPort(port: number, timeoutMs: number): Promise<void> {
  const started = Date.now();
  return new Promise((resolve, reject) => {
    const attempt = () => {
      const socket = createConnection({ host: '127.0.0.1', port }, () => {
        socket.end();
        resolve();
      });
      socket.on('error', () => {
        socket.destroy();
        if (Date.now() - started > timeoutMs)
          reject(new Error(`maildev did not open port ${port}`));
        else setTimeout(attempt, 100);
      });
    };
    attempt();
  });
}

/**
 * Runs maildev 3 as a child process: SMTP on `smtpPort` and its web inbox on `webPort`, both on
 * 127.0.0.1. For `npm start` only; the child dies with the server.
 */
export async function startEmbeddedMaildev(
  smtpPort: number,
  webPort: number,
): Promise<EmbeddedMaildev> {
  const entry = fileURLToPath(import.meta.resolve('maildev'));
  const bin = path.join(path.dirname(entry), 'bin', 'maildev.js');
  const child: ChildProcess = spawn(
    process.execPath,
    [bin, '--smtp', String(smtpPort), '--web', String(webPort), '--ip', '127.0.0.1', '--silent'],
    { stdio: ['ignore', 'ignore', 'inherit'] },
  );
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  try {
    await Promise.race([
      waitForPort(smtpPort, 15000),
      exited.then(() => {
        throw new Error('maildev exited at start (is the port taken?)');
      }),
    ]);
  } catch (e) {
    child.kill();
    throw e;
  }
  return {
    inboxUrl: `http://127.0.0.1:${webPort}`,
    stop: async () => {
      if (child.exitCode === null) {
        child.kill('SIGTERM');
        await exited;
      }
    },
  };
}
