// The load bench's yardstick: a bare Express 5 server, in a process of its own, that answers
// GET /api/p/:token with the very bytes and content type the app answered for the link (read from
// the file named on the command line); it listens on PORT, as the app does), so the bench can say how near the app runs to the machine.
import express from 'express';
import { readFileSync } from 'node:fs';

const [bodyFile, contentType] = process.argv.slice(2);
const body = readFileSync(bodyFile);
const app = express();
app.get('/api/p/:token', (_req, res) => {
  res.type(contentType).send(body);
});
// Answers the readiness poll (server-process.ts) like the app does: any status will do.
app.get('/api/auth/me', (_req, res) => {
  res.status(401).end();
});
const server = app.listen(Number(process.env.PORT), '127.0.0.1');
process.on('SIGTERM', () => server.close(() => process.exit(0)));
