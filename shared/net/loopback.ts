/**
 * True for a loopback host name or address (localhost, *.localhost, 127.0.0.0/8, ::1), with or
 * without a port or IPv6 brackets: "127.0.0.1:3000", "[::1]:3000", "localhost".
 */
export function isLoopbackHost(host: string): boolean {
  let h = host.trim().toLowerCase()
  if (h.startsWith('[')) h = h.slice(1, h.indexOf(']') > 0 ? h.indexOf(']') : undefined)
  else if (h.split(':').length === 2) h = h.split(':')[0]!
  if (h.startsWith('::ffff:') && h.includes('.')) h = h.slice(7)
  return h === 'localhost' || h.endsWith('.localhost') || h === '::1' || /^127\.\d{1,3}\.\d{1,3}\.\d{1,3}$/.test(h)
}
