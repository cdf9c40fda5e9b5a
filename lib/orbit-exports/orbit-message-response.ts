/** The HTTP answer of every orbit data message download: KVN text as an attachment, with its SHA-256. */
export function orbitMessageResponse(file: { text: string; filename: string; sha256?: string }): Response {
  const bytes = Buffer.from(file.text, 'utf8');
  return new Response(new Uint8Array(bytes), {
    headers: {
      'content-type': 'text/plain; charset=utf-8',
      'content-length': String(bytes.length),
      'content-disposition': `attachment; filename="${file.filename}"`,
      ...(file.sha256 ? { 'x-content-sha256': file.sha256 } : {}),
      'cache-control': 'private, no-store',
    },
  });
}
