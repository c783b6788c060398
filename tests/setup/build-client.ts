import { build } from 'vite';

/**
 * The browser tests drive the built client served by the real server, so build it once first — as `npm start`
 * builds it: vitest sets NODE_ENV=test, which would otherwise give React's development build (several times
 * slower, so the page's figures would not be the product's).
 */
export default async function setup() {
  const before = process.env.NODE_ENV;
  process.env.NODE_ENV = 'production';
  try {
    await build({ logLevel: 'warn', mode: 'production' });
  } finally {
    process.env.NODE_ENV = before;
  }
}
