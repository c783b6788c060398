import { build } from 'vite';

/** The browser tests drive the built client served by the real server, so build it once first. */
export default async function setup() {
  await build({ logLevel: 'warn' });
}
