import { usePathname } from 'expo-router';
import Head from 'expo-router/head';

// Every page has its own title (the browser tab, history, and what a screen reader announces first).
const TITLES: Record<string, string> = {
  '': 'Rigs',
  'sign-in': 'Sign in',
  'sign-up': 'Create your account',
  'check-inbox': 'Check your inbox',
  'forgot-password': 'Forgot your password',
  'reset-password': 'New password',
  settings: 'Settings',
  clients: 'Clients',
  'cable-runs': 'Cable runs',
  invitations: 'Invitation',
  new: 'New rig',
  loads: 'Loads',
  power: 'Power',
  try: 'Try a load',
  readings: 'Readings',
  notes: 'Notes',
  people: 'People',
  history: 'History',
  reports: 'Reports',
};

export function titleOf(pathname: string): string {
  const parts = pathname.split('/').filter(Boolean);
  if (parts[0] === 'rigs' && parts.length === 2) return parts[1] === 'new' ? TITLES.new : 'Outlook';
  const last = parts[parts.length - 1] ?? '';
  return TITLES[last] ?? (parts[0] === 'invitations' ? TITLES.invitations : 'Keyoff');
}

export function PageTitle() {
  const pathname = usePathname();
  return (
    <Head>
      <title>{`${titleOf(pathname)} · Keyoff`}</title>
    </Head>
  );
}
