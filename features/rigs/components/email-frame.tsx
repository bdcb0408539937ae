import { Small } from '@/components/ui';

/** On a phone app the e-mail is in the mail program; the web shows it in a frame (email-frame.web.tsx). */
export function EmailFrame(_props: { rigId: string; emailId: string; title: string }) {
  return <Small>Open this e-mail in your mail program; the web app shows it here.</Small>;
}

/** The next weekly report, previewed; the web shows it in a frame (email-frame.web.tsx). */
export function ReportPreviewFrame(_props: { rigId: string }) {
  return <Small>The preview of the next report shows in the web app.</Small>;
}
