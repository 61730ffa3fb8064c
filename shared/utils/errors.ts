/** The human message of a failed request ($fetch's error, or one shaped like it): the server's `message`, else a generic line. */
export function errorMessage(error: unknown): string {
  const e = error as { data?: { message?: string }; statusMessage?: string; message?: string }
  return e?.data?.message || e?.statusMessage || e?.message || 'Something went wrong. Try again.'
}

/** The HTTP status of a failed request, or 0 when the server was not reached. */
export function errorStatus(error: unknown): number {
  const e = error as { statusCode?: number; status?: number; response?: { status?: number } }
  return e?.statusCode ?? e?.status ?? e?.response?.status ?? 0
}
