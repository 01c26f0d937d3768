/**
 * The local Stripe fake as its own process (`node --import tsx server/fakes/stripe/index.ts`),
 * started by the scripts on loopback. The app reaches it only through the Stripe SDK pointed at
 * STRIPE_API_URL, exactly as it reaches api.stripe.com in production.
 */
import { z } from 'zod';
import { createStripeFake, DEFAULT_WEBHOOK_SECRET } from './app';

const parsed = z
  .object({
    STRIPE_FAKE_PORT: z.coerce.number().int().min(1).max(65535).default(12111),
    STRIPE_FAKE_HOST: z.string().min(1).default('127.0.0.1'),
    /** the app's webhook endpoint; unset: events are kept for GET /v1/events only */
    STRIPE_WEBHOOK_URL: z.url().optional(),
    STRIPE_WEBHOOK_SECRET: z.string().startsWith('whsec_').default(DEFAULT_WEBHOOK_SECRET),
    STRIPE_FAKE_PUBLIC_URL: z.url().optional(),
  })
  .safeParse(process.env);

if (!parsed.success) {
  console.error(
    `[stripe-fake] invalid configuration in the environment:\n${parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`).join('\n')}`,
  );
  process.exit(1);
}
const env = parsed.data;
const publicUrl = (env.STRIPE_FAKE_PUBLIC_URL ?? `http://${env.STRIPE_FAKE_HOST}:${env.STRIPE_FAKE_PORT}`).replace(/\/$/, '');

const fake = createStripeFake({
  webhookUrl: env.STRIPE_WEBHOOK_URL,
  webhookSecret: env.STRIPE_WEBHOOK_SECRET,
  publicUrl,
});

const server = fake.app.listen(env.STRIPE_FAKE_PORT, env.STRIPE_FAKE_HOST, () => {
  console.log(`[stripe-fake] API on http://${env.STRIPE_FAKE_HOST}:${env.STRIPE_FAKE_PORT}/v1, test payment page at ${publicUrl}/pay/:id`);
  console.log(`[stripe-fake] webhooks ${env.STRIPE_WEBHOOK_URL ? `to ${env.STRIPE_WEBHOOK_URL}` : 'off (STRIPE_WEBHOOK_URL unset)'}`);
});
server.on('error', (err) => {
  console.error('[stripe-fake]', err.message);
  process.exit(1);
});

const stop = () => {
  fake.close();
  server.close(() => process.exit(0));
  setTimeout(() => process.exit(0), 2000).unref();
};
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
