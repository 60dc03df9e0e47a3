/** Starts the web server (and, by default, a job worker) against the configured database. */
import { loadConfig } from './config';
import { createApp } from './app';
import { closeDb, initDb } from './db/client';
import { logger } from './logger';
import { ensureFakeSmtp, stopFakeSmtp } from './mail/mail.service';
import { startJobWorker, type JobWorker } from './jobs/job-worker';
import { stopBoss } from './jobs/boss';
import { previewThread } from './horizon-preview/preview-thread-client';

async function main() {
  const config = loadConfig();
  initDb(config.DATABASE_URL);
  if (config.FAKE_SMTP === 'true') {
    const smtp = await ensureFakeSmtp(config.SMTP_PORT);
    logger.info(`Fake SMTP server on 127.0.0.1:${smtp.port}: e-mails land in the admin's mail outbox`);
  }
  const app = createApp(config);
  const server = app.listen(config.PORT, () => logger.info(`Slackwater listening on ${config.appOrigin}`));
  server.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code === 'EADDRINUSE') {
      console.error(`Port ${config.PORT} is already in use. Stop the program using it or start with PORT=<another port>.`);
    } else {
      console.error(`The web server could not start: ${error.message}`);
    }
    process.exit(1);
  });
  // Loads the engine in the horizon preview's thread now, not on the first slider move.
  previewThread.warm();
  // RUN_WORKER=false leaves the jobs to `npm run worker` processes (README: scaling past one machine).
  const worker: JobWorker | null = config.RUN_WORKER === 'true' ? await startJobWorker(config.DATABASE_URL) : null;

  let stopping = false;
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    logger.info('Stopping Slackwater…');
    server.close();
    await worker?.stop();
    await previewThread.close();
    await stopBoss();
    await stopFakeSmtp();
    await closeDb();
    process.exit(0);
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
