/** Lower-case hex of some bytes, two digits a byte. */
export function toHex(bytes: ArrayBuffer | Uint8Array): string {
  return Array.from(bytes instanceof Uint8Array ? bytes : new Uint8Array(bytes), (byte) => byte.toString(16).padStart(2, '0')).join('');
}

/**
 * The hex SHA-256 of some bytes (Web Crypto). The server names an upload by the same digest,
 * so a device knows a cover's id before it is uploaded.
 */
export async function sha256Hex(data: BufferSource | Blob): Promise<string> {
  const bytes = data instanceof Blob ? await data.arrayBuffer() : data;
  return toHex(await crypto.subtle.digest('SHA-256', bytes));
}
