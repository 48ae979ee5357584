import { describe, expect, it } from 'vitest';
import { isLoopbackUrl } from './loopback';

describe('isLoopbackUrl', () => {
  it.each([
    'http://127.0.0.1:4320/',
    'http://127.8.9.10/x',
    'http://localhost:4325/api/messages',
    'http://[::1]:4320/',
    'ws://127.0.0.1:4320/socket',
    'data:image/png;base64,AAAA',
    'blob:http://127.0.0.1:4320/0b6c',
    'about:blank',
  ])('lets %s through', (url) => {
    expect(isLoopbackUrl(url)).toBe(true);
  });

  it.each([
    'http://198.51.100.7/pixel.png',
    'https://fonts.example.com/font.woff2',
    'http://127.0.0.1.example.net/',
    'http://localhost.example/',
    'http://128.0.0.1/',
    'http://[::2]/',
    'wss://203.0.113.4/live',
    'not a url',
  ])('blocks %s', (url) => {
    expect(isLoopbackUrl(url)).toBe(false);
  });
});
