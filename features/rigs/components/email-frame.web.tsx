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
