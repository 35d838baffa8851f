import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import { trustedOrigins } from '@/server/trusted-origins';
import { createTestApp, TEST_PASSWORD, type TestContext } from '../factories/test-app';

const contexts: TestContext[] = [];
afterEach(() => {
  for (const ctx of contexts.splice(0)) ctx.close();
});

function signUpFrom(origin: string, production = false) {
  const ctx = createTestApp({ config: { production } });
  contexts.push(ctx);
  return request(ctx.app)
    .post('/api/auth/sign-up/email')
    .set('Origin', origin)
    .send({ name: 'Newcomer', email: 'newcomer@example.test', password: TEST_PASSWORD });
}

describe('origins in development', () => {
  it.each(['http://localhost:8080', 'http://127.0.0.1:8080', 'http://[::1]:8080'])(
    'when a newcomer signs up from %s, then it works',
    async (origin) => {
      expect((await signUpFrom(origin)).status).toBe(200);
    },
  );

  it.each(['http://127.0.0.1:9090', 'http://evil.example'])(
    'when the page is at %s, then the refusal names the address to open',
    async (origin) => {
      const response = await signUpFrom(origin);
      expect(response.status).toBe(403);
      // The API's origin check answers before better-auth's own, with the stable error body.
      expect(response.body.error.code).toBe('forbidden_origin');
      expect(response.body.error.message).toContain('Open http://localhost:8080');
    },
  );
});

describe('origins in production', () => {
  it('when the page is at another loopback spelling, then it is refused with the address to open', async () => {
    const response = await signUpFrom('http://127.0.0.1:8080', true);
    expect(response.status).toBe(403);
    expect(response.body.error.message).toContain('Open http://localhost:8080');
  });
});

describe('trustedOrigins', () => {
  it('when PUBLIC_URL is a loopback address outside production, then every loopback spelling of its port is trusted', () => {
    expect(trustedOrigins({ publicUrl: 'http://127.0.0.1:3000/' }).sort()).toEqual(
      ['http://127.0.0.1:3000', 'http://[::1]:3000', 'http://localhost:3000'].sort(),
    );
  });

  it('when PUBLIC_URL is a real host, then only it and the dev server are trusted', () => {
    expect(
      trustedOrigins({
        publicUrl: 'https://plan.example.org',
        devWebOrigin: 'http://localhost:8081',
        production: false,
      }),
    ).toEqual(['https://plan.example.org', 'http://localhost:8081']);
  });

  it('when in production, then a loopback PUBLIC_URL is trusted as written only', () => {
    expect(trustedOrigins({ publicUrl: 'http://localhost:8080', production: true })).toEqual(['http://localhost:8080']);
  });
});
