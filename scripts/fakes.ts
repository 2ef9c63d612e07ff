/**
 * Local stand-ins for hosted services, on loopback only:
 *  - an SMTP catcher (maildev) with a web inbox, for mail sent through nodemailer;
 *  - an S3-compatible object store (s3rver), used through @aws-sdk/client-s3.
 * Runs until SIGINT/SIGTERM. Ports and folders come from scripts/profile.sh.
 * Start it with `node --openssl-legacy-provider`: s3rver makes its listing continuation tokens with
 * DES, which OpenSSL 3 keeps in its legacy provider; without it every listing past one page fails.
 */
import { mkdirSync } from 'node:fs';
import { MailDev } from 'maildev';
import S3rver from 's3rver';

if (!process.execArgv.includes('--openssl-legacy-provider')) {
  console.warn('fakes: started without --openssl-legacy-provider; object listings longer than one page will fail');
}

const smtpPort = Number(process.env.PF_SMTP_PORT ?? 2525);
const webPort = Number(process.env.PF_MAIL_WEB_PORT ?? 2580);
const s3Port = Number(process.env.PF_S3_PORT ?? 4569);
const s3Dir = process.env.PF_S3_DIR ?? '.runtime/s3-dev';
const bucket = process.env.S3_BUCKET ?? 'phosforge-files';

mkdirSync(s3Dir, { recursive: true });
const maildev = new MailDev({ smtp: smtpPort, web: webPort, ip: '127.0.0.1', silent: true });
await maildev.start();
const s3 = new S3rver({
  port: s3Port,
  address: '127.0.0.1',
  silent: true,
  directory: s3Dir,
  configureBuckets: [{ name: bucket, configs: [] }]
});
await s3.run();
console.log(
  `fakes: SMTP catcher 127.0.0.1:${smtpPort} (inbox http://127.0.0.1:${webPort}), S3 fake http://127.0.0.1:${s3Port} bucket ${bucket}`
);

let stopping = false;
async function stop() {
  if (stopping) return;
  stopping = true;
  await Promise.allSettled([maildev.stop(), s3.close()]);
  process.exit(0);
}
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
