import { Stack } from 'expo-router';
import Head from 'expo-router/head';

/**
 * A route's title, for the navigator and for the browser tab: Expo Router leaves the document
 * title alone and sets it through its Head component instead.
 */
export function PageTitle({ title }: { title: string }) {
  return (
    <>
      <Stack.Screen options={{ title }} />
      <Head>
        <title>{title}</title>
      </Head>
    </>
  );
}
