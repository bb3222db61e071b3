import { DevInbox } from './dev-inbox';

/** `npm start` runs this beside the server: the development SMTP inbox on 127.0.0.1. */
const port = Number(process.env['LAMPLIGHT_DEV_SMTP_PORT'] ?? 2525);
const dir = process.env['LAMPLIGHT_DEV_MAIL_DIR'] ?? null;
const inbox = new DevInbox(dir);

inbox.listen(port).then(
  (listening) => console.log(`Development mail inbox on smtp://127.0.0.1:${listening} (read it on the Admin › Mail page)`),
  (err: Error) => {
    console.error(`The development mail inbox could not listen on ${port}: ${err.message}`);
    process.exit(1);
  },
);
const stop = () => void inbox.close().then(() => process.exit(0));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
