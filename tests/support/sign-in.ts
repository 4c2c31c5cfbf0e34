import request from 'supertest';
import type { Express } from 'express';
import { TEST_PASSWORD } from '@/fixtures/builders';

/** A supertest agent signed in as the user (session cookie kept by the agent). */
export async function signedInAgent(app: Express, email: string, password = TEST_PASSWORD) {
  const agent = request.agent(app);
  const res = await agent.post('/api/auth/sign-in').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in failed for ${email}: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}

/** Header the web app sends on every state-changing request. */
export const APP_HEADER = { 'x-ovalyard-request': '1' } as const;
