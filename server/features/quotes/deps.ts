import type { Db } from '../../../db';
import type { Config } from '../../lib/config';
import type { Mailer } from '../../lib/mail';
import type { FileStorage } from '../../lib/storage';

export interface QuoteDeps {
  db: Db;
  mailer: Mailer;
  config: Config;
  /** uploaded files, outside the web root */
  storage: FileStorage;
}
