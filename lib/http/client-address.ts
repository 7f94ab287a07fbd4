import { isIP } from "node:net";

// The client's address for per-address limits, in a form a client cannot choose.
//
// X-Forwarded-For is a list each proxy appends to: the address it received the request from
// goes on the right (MDN Web Docs, "X-Forwarded-For", 2024; RFC 7239 section 5.2, 2014, for
// the standard form of the same idea). Anything to the left of what our own proxies wrote is
// whatever the client sent, so with N trusted proxies in front of the app the client is the
// N-th entry from the right, and with none the header is ignored entirely.

export const UNKNOWN_ADDRESS = "unknown";

export type AddressSource = {
  /** The X-Forwarded-For header as received (several headers joined by commas), if any. */
  forwardedFor?: string | null;
  /** The peer address of the connection, where the server exposes it. */
  remoteAddress?: string | null;
  /** How many proxies of ours stand in front of the app (TRUSTED_PROXY_COUNT). */
  trustedProxies: number;
};

function normalize(address: string | null | undefined): string | null {
  if (!address) return null;
  let value = address.trim();
  // "[2001:db8::1]:443" and "203.0.113.7:80" as some proxies write them.
  const bracketed = /^\[([^\]]+)\](?::\d+)?$/.exec(value);
  if (bracketed) value = bracketed[1]!;
  else if (/^\d{1,3}(\.\d{1,3}){3}:\d+$/.test(value)) value = value.replace(/:\d+$/, "");
  if (value.startsWith("::ffff:") && isIP(value.slice(7)) === 4) value = value.slice(7);
  return isIP(value) ? value.toLowerCase() : null;
}

/** The client address, from the connection or through exactly `trustedProxies` proxies. */
export function resolveClientAddress({ forwardedFor, remoteAddress, trustedProxies }: AddressSource): string {
  const peer = normalize(remoteAddress);
  if (trustedProxies <= 0) return peer ?? UNKNOWN_ADDRESS;
  const hops = (forwardedFor ?? "").split(",").map((h) => h.trim()).filter((h) => h !== "");
  // Where the connection is known, it is the nearest proxy; the chain then reads hops + peer
  // and the client sits `trustedProxies` places left of its end. Without it, the nearest proxy
  // appended the address it saw last, and the client is the `trustedProxies`-th hop from the right.
  const chain = peer ? [...hops, peer] : hops;
  const index = chain.length - (peer ? 1 : 0) - trustedProxies;
  if (index < 0) return UNKNOWN_ADDRESS;
  return normalize(chain[index]) ?? UNKNOWN_ADDRESS;
}
