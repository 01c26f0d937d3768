/** The one date, number and money format of pages, PDFs and e-mails (shared/format.ts). */
export { formatCount, formatDate, formatDateTime, formatMoney, formatNumber, plural } from '@shared/format';
