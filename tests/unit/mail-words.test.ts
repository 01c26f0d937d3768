import { describe, expect, it } from 'vitest';
import { explainMailError } from '../../src/views/admin/mail-log/mail-words';

// Error texts as nodemailer reports them (the first seen in tests/api/mail-log.test.ts against a
// closed port; the SMTP replies are RFC 5321 reply codes, written from memory).
describe('explainMailError', () => {
  it('puts the usual delivery errors in words', () => {
    expect(explainMailError('connect ECONNREFUSED 127.0.0.1:1')).toMatch(/refused the connection/);
    expect(explainMailError('getaddrinfo ENOTFOUND smtp.example.invalid')).toMatch(/name could not be found/);
    expect(explainMailError('Connection timeout')).toMatch(/did not answer in time/);
    expect(explainMailError('Invalid login: 535 5.7.8 Authentication credentials invalid')).toMatch(/sign-in/);
    expect(explainMailError("Can't send mail - all recipients were rejected: 550 5.1.1 <x@example.com>: user unknown")).toMatch(/refused the message/);
    expect(explainMailError('Message failed: 451 4.3.0 Temporary local problem')).toMatch(/try again later/);
  });

  it('does not read a port number as a server reply, and has words for the unknown', () => {
    expect(explainMailError('Connection closed unexpectedly by 10.0.0.5:465')).toMatch(/cut off/);
    expect(explainMailError('something nobody expected')).toBe('The mail server did not take the message.');
    expect(explainMailError(null)).toBeNull();
  });
});
