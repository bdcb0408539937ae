import type { PropsWithChildren } from 'react';
import { ScrollViewStyleReset } from 'expo-router/html';

// The HTML around every exported page (web only, at build time): Expo's own head plus what makes the app
// installable: a description, the theme colour and the manifest (written by scripts/finish-web.ts).
export default function Root({ children }: PropsWithChildren) {
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta httpEquiv="X-UA-Compatible" content="IE=edge" />
        <meta name="viewport" content="width=device-width, initial-scale=1, shrink-to-fit=no" />
        <meta name="description" content="Keyoff keeps a camper's 12 V battery budget: how many days you can stay parked, what drains it, and what fixes it." />
        <meta name="theme-color" content="#17324A" />
        <link rel="manifest" href="/manifest.webmanifest" />
        <link rel="apple-touch-icon" href="/apple-touch-icon.png" />
        <ScrollViewStyleReset />
      </head>
      <body>{children}</body>
    </html>
  );
}
