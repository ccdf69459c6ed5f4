import { api } from './api-client';

/**
 * Fetches a file through the API client (so the request carries the sign-in token) and hands it
 * to the browser as a download under the given name.
 */
export async function downloadFile(path: string, fileName: string): Promise<void> {
  const { data } = await api.get<Blob>(path, { responseType: 'blob' });
  const url = URL.createObjectURL(data);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.click();
  URL.revokeObjectURL(url);
}
