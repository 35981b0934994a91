// The signed-in person's notices (GET /notifications, POST /notifications/:id/read).
import type { NoticeKind } from './notice-kinds';

export interface NoticeRecord {
  id: string;
  kind: NoticeKind;
  title: string;
  body: string;
  /** An app path, e.g. /receive/<id>. */
  link: string | null;
  readAt: string | null;
  createdAt: string;
}

export interface NoticeList {
  items: NoticeRecord[];
  unread: number;
}
