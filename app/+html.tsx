import { ScrollViewStyleReset } from 'expo-router/html';
import type { PropsWithChildren } from 'react';

// The web document around the app. Runs only in Node during export: no browser APIs here.
export default function Root({ children }: PropsWithChildren) {
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta httpEquiv="X-UA-Compatible" content="IE=edge" />
        <meta name="viewport" content="width=device-width, initial-scale=1, shrink-to-fit=no" />
        <meta name="description" content="Trailtally: will your stored energy last the trip?" />
        <meta name="theme-color" content="#2D6A4F" />
        <ScrollViewStyleReset />
        <style>{'body { background-color: #FCF6EC; }'}</style>
      </head>
      <body>{children}</body>
    </html>
  );
}
