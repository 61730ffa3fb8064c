import type { H3Event } from 'h3'
import type { TLSSocket } from 'node:tls'

let trusted: Set<string> | null = null

/** Strips the IPv4-mapped prefix so "::ffff:10.0.0.5" and "10.0.0.5" are one address. */
export function normaliseAddress(address: string): string {
  const a = address.trim().toLowerCase()
  return a.startsWith('::ffff:') && a.includes('.') ? a.slice(7) : a
}

/**
 * The reverse proxies whose X-Forwarded-For / X-Forwarded-Proto / X-Forwarded-Host are believed:
 * runtime config `trustedProxies` (NUXT_TRUSTED_PROXIES), a comma-separated list of exact
 * addresses. None by default, so a client cannot choose its own address.
 */
export function trustedProxies(): Set<string> {
  trusted ??= new Set(
    String(useRuntimeConfig().trustedProxies || '')
      .split(',')
      .map(s => s.trim())
      .filter(Boolean)
      .map(normaliseAddress),
  )
  return trusted
}

function peer(event: H3Event): string {
  return normaliseAddress(event.node.req.socket?.remoteAddress ?? 'unknown')
}

function fromTrustedProxy(event: H3Event): boolean {
  return trustedProxies().has(peer(event))
}

/**
 * The caller's address: the socket's peer, or, when that peer is a trusted proxy, the right-most
 * X-Forwarded-For entry that is not itself a trusted proxy (the left part is the client's to forge).
 */
export function clientAddress(event: H3Event): string {
  const direct = peer(event)
  if (!fromTrustedProxy(event)) return direct
  const hops = String(getHeader(event, 'x-forwarded-for') ?? '').split(',').map(s => normaliseAddress(s)).filter(Boolean)
  for (let i = hops.length - 1; i >= 0; i--) {
    if (!trustedProxies().has(hops[i]!)) return hops[i]!.slice(0, 64)
  }
  return (hops[0] ?? direct).slice(0, 64)
}

/** True when the request reached the browser's side over HTTPS: a TLS socket, or a trusted proxy saying so. */
export function isHttps(event: H3Event): boolean {
  if ((event.node.req.socket as TLSSocket | undefined)?.encrypted) return true
  if (!fromTrustedProxy(event)) return false
  const proto = String(getHeader(event, 'x-forwarded-proto') ?? '').split(',')[0]!.trim().toLowerCase()
  return proto === 'https'
}

/** The origin the browser used for this request ("http://host:port"), for same-origin checks. */
export function requestOrigin(event: H3Event): string {
  const forwarded = fromTrustedProxy(event) ? String(getHeader(event, 'x-forwarded-host') ?? '').split(',')[0]!.trim() : ''
  const host = forwarded || String(getHeader(event, 'host') ?? '')
  return `${isHttps(event) ? 'https' : 'http'}://${host.toLowerCase()}`
}
