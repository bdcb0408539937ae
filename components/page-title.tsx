import Head from 'expo-router/head';

/** The page's title on the web, most specific first: "Outlook · Wren · Keyoff". The deepest one shown wins. */
export function PageTitle({ parts }: { parts: (string | null | undefined)[] }) {
  const title = [...parts.filter((p): p is string => !!p && p.trim() !== ''), 'Keyoff'].join(' · ');
  return (
    <Head>
      <title>{title}</title>
    </Head>
  );
}
