/**
 * The client's network address, for per-address rate limits. `next start` fills
 * X-Forwarded-For with the socket's address when the header is absent; behind a reverse
 * proxy, the proxy must set it (and strip any value sent by the client).
 */
export function clientAddress(headers: Headers | Record<string, string | string[] | undefined>): string {
  const get = (name: string): string | undefined => {
    if (headers instanceof Headers) return headers.get(name) ?? undefined;
    const v = headers[name];
    return Array.isArray(v) ? v[0] : v;
  };
  const forwarded = get('x-forwarded-for')?.split(',')[0]?.trim();
  return (forwarded || get('x-real-ip') || 'unknown').slice(0, 64);
}
