/**
 * Files a customer attaches to a quote: refused at once in the browser when over 20 MB (the server
 * checks again, and checks the content), then uploaded one after another with each file's result kept
 * for the page to show.
 */
import { computed, ref } from 'vue';
import type { Attachment } from '@shared/schemas/quotes';
import { errorMessage } from '../api/http';
import { uploadAttachment } from '../api/quotes';

/** The server's limit (server/features/quotes/attachments.ts). */
export const MAX_UPLOAD_BYTES = 20 * 1024 * 1024;
/** What the file chooser offers; the server decides by content, not by name. */
export const ACCEPTED_FILES = '.pdf,.png,.jpg,.jpeg,.csv,.xlsx';

export type UploadStatus = 'waiting' | 'uploading' | 'done' | 'refused' | 'failed';

export interface PendingFile {
  key: number;
  file: File;
  status: UploadStatus;
  /** why a file was refused or failed */
  message?: string;
}

export function fileSizeLabel(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(0)} kB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

export function useQuoteUploads() {
  const files = ref<PendingFile[]>([]);
  const busy = ref(false);
  let nextKey = 1;

  function add(list: Iterable<File>): void {
    for (const file of list) {
      const tooBig = file.size > MAX_UPLOAD_BYTES;
      files.value.push({
        key: nextKey++,
        file,
        status: tooBig ? 'refused' : 'waiting',
        message: tooBig ? `${fileSizeLabel(file.size)} is over the 20 MB limit: this file will not be sent.` : undefined,
      });
    }
  }

  function remove(key: number): void {
    files.value = files.value.filter((f) => f.key !== key);
  }

  /** Uploads every waiting (or earlier failed) file to the quote; returns what the server stored. */
  async function uploadAll(quoteId: string): Promise<Attachment[]> {
    const stored: Attachment[] = [];
    busy.value = true;
    try {
      for (const entry of files.value) {
        if (entry.status !== 'waiting' && entry.status !== 'failed') continue;
        entry.status = 'uploading';
        entry.message = undefined;
        try {
          stored.push(await uploadAttachment(quoteId, entry.file));
          entry.status = 'done';
        } catch (error) {
          entry.status = 'failed';
          entry.message = errorMessage(error);
        }
      }
    } finally {
      busy.value = false;
    }
    return stored;
  }

  /** Drops the files that went up, keeping refused and failed ones with their messages. */
  function clearDone(): void {
    files.value = files.value.filter((f) => f.status !== 'done');
  }

  const toSend = computed(() => files.value.filter((f) => f.status === 'waiting' || f.status === 'failed').length);
  const failed = computed(() => files.value.filter((f) => f.status === 'failed').length);

  return { files, busy, toSend, failed, add, remove, uploadAll, clearDone };
}

export type QuoteUploads = ReturnType<typeof useQuoteUploads>;
