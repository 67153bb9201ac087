import { describe, expect, it } from 'vitest';
import { MAX_UPLOAD_BYTES, MissingFileError, UnsupportedUploadError, UploadTooLargeError, uploadedText } from './uploaded-text.js';

const file = (name: string, bytes: Buffer) => ({ originalname: name, size: bytes.length, buffer: bytes });

describe('uploadedText', () => {
  it('returns the text of a UTF-8 file with an accepted name, without a byte-order mark', () => {
    const sut = uploadedText(file('Sweep.CSV', Buffer.from('\uFEFFfrequency_hz,amplitude_db\nµ\n')), [/\.csv$/i]);
    expect(sut).toMatchObject({ text: 'frequency_hz,amplitude_db\nµ\n', fileName: 'Sweep.CSV' });
  });

  it('refuses a missing file, another extension, NUL bytes and invalid UTF-8, naming the reason', () => {
    expect(() => uploadedText(undefined, [/\.csv$/i])).toThrow(MissingFileError);
    expect(() => uploadedText(file('a.exe', Buffer.from('x')), [/\.csv$/i, /\.s\d{1,2}p$/i])).toThrow(/"a.exe" is not accepted: the name must end in .csv or .s/);
    expect(() => uploadedText(file('a.csv', Buffer.from([0x61, 0x00])), [/\.csv$/i])).toThrow(/NUL bytes/);
    // 0xC3 0x28 is an invalid two-byte UTF-8 sequence (Unicode 15, table 3-7 well-formed sequences).
    expect(() => uploadedText(file('a.csv', Buffer.from([0xc3, 0x28])), [/\.csv$/i])).toThrow(UnsupportedUploadError);
  });

  it('refuses a file above the limit with a 413-mapped error', () => {
    const big = { originalname: 'big.csv', size: MAX_UPLOAD_BYTES + 1, buffer: Buffer.from('a') };
    expect(() => uploadedText(big, [/\.csv$/i])).toThrow(UploadTooLargeError);
    expect(new UploadTooLargeError('big.csv', 1, 0).kind).toBe('too_large');
  });
});
