// The kinds of in-app notice (each can also come by e-mail): the one list the database check, the server's
// mail, the notices screen and the e-mail settings read.
export const NOTICE_KINDS = ['lot-held', 'hardware-gap', 'pairing-review', 'pairing-decision', 'verdict-differs'] as const;
export type NoticeKind = (typeof NOTICE_KINDS)[number];

export const NOTICE_KIND_WORDS: Record<NoticeKind, { tag: string; mail: string; setting: string }> = {
  'lot-held': { tag: 'Lot on hold', mail: 'A lot was put on hold at the dock', setting: 'A lot is put on hold at the dock' },
  'hardware-gap': { tag: 'Hardware needed', mail: 'A sourcing plan or held lot needs hardware', setting: 'A plan or held lot needs hardware' },
  'pairing-review': { tag: 'Pairing to review', mail: 'A pairing awaits your review', setting: 'A pairing awaits my review' },
  'pairing-decision': { tag: 'Pairing decided', mail: 'Your pairing was approved or rejected', setting: 'My pairing is approved or rejected' },
  'verdict-differs': { tag: 'Verdict differs', mail: 'A dock check made offline got another verdict', setting: 'A dock check made offline gets another verdict from the server' },
};
