import { fileTypeFromBuffer } from 'file-type';

/** The kinds of file a customer may attach, checked by content and by name. */
const ALLOWED: Record<string, { mime: string; extensions: string[] }> = {
  pdf: { mime: 'application/pdf', extensions: ['pdf'] },
  png: { mime: 'image/png', extensions: ['png'] },
  jpg: { mime: 'image/jpeg', extensions: ['jpg', 'jpeg'] },
  xlsx: { mime: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', extensions: ['xlsx'] },
  csv: { mime: 'text/csv', extensions: ['csv'] },
};

export const ALLOWED_DESCRIPTION = 'PDF, PNG, JPEG, CSV or XLSX';

/**
 * The content type of an upload, from its bytes: binary formats by their signature (file-type),
 * CSV as valid UTF-8 text without NUL bytes. The name's extension must agree with the content, so a
 * renamed executable or a PDF called .png is refused. Returns null when the file is not allowed.
 */
export async function sniffUpload(content: Buffer, filename: string): Promise<string | null> {
  const ext = filename.toLowerCase().split('.').pop() ?? '';
  const detected = await fileTypeFromBuffer(content);
  if (detected) {
    const kind = ALLOWED[detected.ext];
    return kind && kind.extensions.includes(ext) ? kind.mime : null;
  }
  if (ext === 'csv' && isPlainText(content)) return ALLOWED.csv!.mime;
  return null;
}

function isPlainText(content: Buffer): boolean {
  if (content.length === 0 || content.includes(0)) return false;
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(content);
    return true;
  } catch {
    return false;
  }
}
