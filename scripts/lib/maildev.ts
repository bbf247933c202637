import { spawn, type ChildProcess } from 'node:child_process';
import { repoRoot, waitForHealth } from './processes';

/** maildev's command line, bound to loopback only. */
export const maildevArgs = (smtpPort: number, webPort: number) => [
  'node_modules/maildev/dist/bin/maildev.js', '--smtp', String(smtpPort), '--web', String(webPort), '--ip', '127.0.0.1', '--web-ip', '127.0.0.1', '--silent',
];

export interface RunningMaildev { child: ChildProcess; smtpPort: number; webPort: number; stop(): Promise<void> }

export async function spawnMaildev(smtpPort: number, webPort: number): Promise<RunningMaildev> {
  const child = spawn(process.execPath, maildevArgs(smtpPort, webPort), { cwd: repoRoot, stdio: 'ignore' });
  await waitForHealth(`http://127.0.0.1:${webPort}/api/email`, 20_000);
  return {
    child,
    smtpPort,
    webPort,
    // maildev keeps mail in memory only, so a hard stop loses nothing we need and saves its 2–3 s goodbye.
    stop: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null || child.signalCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGKILL');
      }),
  };
}
