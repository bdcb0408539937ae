import { apiUrl } from '@/lib/api-client';
import { colors, radius } from '@/shared/theme';

/** The e-mail as it was sent, in a sandboxed frame (no scripts; the server's own policy forbids them too). */
export function EmailFrame({ rigId, emailId, title }: { rigId: string; emailId: string; title: string }) {
  return (
    <iframe
      title={title}
      src={apiUrl(`/api/rigs/${rigId}/emails/${emailId}`)}
      sandbox="allow-same-origin allow-popups"
      data-testid="email-frame"
      style={{ width: '100%', height: 720, border: `1px solid ${colors.line}`, borderRadius: radius.md, background: '#FFFFFF' }}
    />
  );
}

/** The next weekly report as it would reach you now, in the same sandboxed frame (nothing is sent). */
export function ReportPreviewFrame({ rigId }: { rigId: string }) {
  return (
    <iframe
      title="Preview of the next weekly report"
      src={apiUrl(`/api/rigs/${rigId}/report-preview`)}
      sandbox="allow-same-origin allow-popups"
      data-testid="report-preview-frame"
      style={{ width: '100%', height: 720, border: `1px solid ${colors.line}`, borderRadius: radius.md, background: '#FFFFFF' }}
    />
  );
}
