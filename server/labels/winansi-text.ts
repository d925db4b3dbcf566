// Characters PDF's standard fonts can draw: WinAnsiEncoding (PDF 32000-1:2008, Annex D.2) is
// printable ASCII, Latin-1's upper half and these extras at 0x80-0x9F.
const WIN_ANSI_EXTRAS = '€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ';

// Letters with no accent-stripping decomposition, spelt the way people write them without the letter.
const SPELT_OUT: Record<string, string> = {
  Ł: 'L', ł: 'l', Đ: 'D', đ: 'd', Ħ: 'H', ħ: 'h', ı: 'i', Ŋ: 'N', ŋ: 'n', ſ: 's', Ŧ: 'T', ŧ: 't', ĸ: 'k',
  Ə: 'E', ə: 'e', Ǝ: 'E', ǝ: 'e', Ɖ: 'D', ɖ: 'd', ẞ: 'SS',
};

function encodable(char: string): boolean {
  const code = char.codePointAt(0)!;
  return (code >= 0x20 && code <= 0x7e) || (code >= 0xa0 && code <= 0xff) || WIN_ANSI_EXTRAS.includes(char);
}

/**
 * Text that Helvetica (WinAnsi) can print: characters it has stay ("Zoë"), others lose their accent
 * ("Łukasz Dőry" becomes "Lukasz Dory"), and anything still unprintable becomes "?".
 */
export function toWinAnsi(text: string): string {
  let out = '';
  for (const char of text.normalize('NFC')) {
    if (encodable(char)) {
      out += char;
      continue;
    }
    const bare = SPELT_OUT[char] ?? char.normalize('NFD').replace(/\p{M}/gu, '');
    out += [...bare].every(encodable) && bare.length > 0 ? bare : /\s/.test(char) ? ' ' : '?';
  }
  return out;
}
