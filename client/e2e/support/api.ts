import { DEMO_PASSWORD } from './accounts';
import { BASE_URL } from './browser';

/**
 * One GraphQL call from a test itself (setting up meets, axes, notes), not through the page.
 * Each test file passes its own fake client address, so the sign-in throttle counts it apart
 * from the browser's sign-ins.
 */
export async function api<T>(query: string, variables: Record<string, unknown>, token?: string, address = `10.79.${process.pid % 250}.9`): Promise<T> {
  const res = await fetch(`${BASE_URL}/graphql`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-forwarded-for': address, ...(token ? { authorization: `Bearer ${token}` } : {}) },
    body: JSON.stringify({ query, variables }),
  });
  const body = (await res.json()) as { data?: T; errors?: { message: string }[] };
  if (!body.data || body.errors) throw new Error(JSON.stringify(body.errors));
  return body.data;
}

/** An access token for a demo account (the seed's shared demo password by default). */
export async function demoToken(email: string, address?: string, password = DEMO_PASSWORD): Promise<string> {
  const { signIn } = await api<{ signIn: { accessToken: string } }>('mutation($i: SignInInput!) { signIn(input: $i) { accessToken } }', { i: { email, password } }, undefined, address);
  return signIn.accessToken;
}
