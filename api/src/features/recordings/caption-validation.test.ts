import { describe, expect, it } from 'vitest';
import { validateWebVtt } from './caption-validation';
import { ValidationError } from '../../errors';

function problems(text: string) {
  try {
    validateWebVtt(text);
  } catch (error) {
    if (error instanceof ValidationError) return { message: error.message, details: error.details };
    throw error;
  }
  throw new Error('expected the file to be refused');
}

// Rules from the W3C WebVTT spec (signature line, timestamps mm:ss.ttt, end after start, escapes end in ";").
describe('validateWebVtt', () => {
  it('counts the cues of a valid file, with a BOM, CRLF line ends and a NOTE', () => {
    const text =
      '\uFEFFWEBVTT - demo\r\n\r\nNOTE made by hand\r\n\r\n1\r\n00:00:00.000 --> 00:00:01.000 align:start\r\n<v Ada>Hi &amp; bye</v>\r\n\r\n00:01.000 --> 00:02.000\r\nTwo\r\n';
    expect(validateWebVtt(text)).toEqual({ cueCount: 2 });
  });

  it('reports a cue-text error on the line it is on, not the blank line after the cue', () => {
    const text = 'WEBVTT\n\n00:00.000 --> 00:02.000\nfirst line\nsecond <i>line\nthird line\n\n00:02.000 --> 00:03.000\nok\n';
    expect(problems(text).details).toEqual([{ path: 'line 6', message: 'Required end tag missing. (column 11)' }]);
  });

  it('counts lines across CRLF ends and reports timing errors on their own line', () => {
    const text = 'WEBVTT\r\n\r\n00:03.000 --> 00:01.000\r\nbackwards\r\n';
    expect(problems(text)).toEqual({
      message: 'The caption file has a problem on line 3: fix it and choose the file again.',
      details: [{ path: 'line 3', message: 'End timestamp is not greater than start timestamp. (column 24)' }],
    });
  });

  it('lists at most 50 problems of a file that is not WebVTT at all', () => {
    const text = ['WEBVTT', '', ...Array.from({ length: 80 }, (_, i) => `00:0${i % 10}.0 --> 00:0${i % 10}.5\n`)].join('\n');
    const refused = problems(text);
    expect(refused.details).toHaveLength(50);
    expect(refused.message).toBe('The caption file has 80 problems; the first 50 are listed. Is it a WebVTT (.vtt) file?');
  });

  it('refuses a file with no cues', () => {
    expect(problems('WEBVTT\n').details).toEqual([{ path: 'vtt', message: 'No cues found after the WEBVTT line.' }]);
  });
});
