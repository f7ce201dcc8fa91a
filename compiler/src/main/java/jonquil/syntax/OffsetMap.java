package jonquil.syntax;

/**
 * Converts ANTLR's code-point indices to UTF-16 offsets. ANTLR counts code points; the rest of
 * Jonquil (and LSP) counts UTF-16 units, which differ after any emoji.
 */
final class OffsetMap {
  private final int[] charOffsetOfCodePoint;
  private final int length;

  OffsetMap(String text) {
    this.length = text.length();
    boolean supplementary = false;
    for (int i = 0; i < text.length() && !supplementary; i++) {
      supplementary = Character.isSurrogate(text.charAt(i));
    }
    if (!supplementary) {
      charOffsetOfCodePoint = null;
      return;
    }
    int cps = text.codePointCount(0, text.length());
    charOffsetOfCodePoint = new int[cps + 1];
    int offset = 0;
    for (int cp = 0; cp < cps; cp++) {
      charOffsetOfCodePoint[cp] = offset;
      offset += Character.charCount(text.codePointAt(offset));
    }
    charOffsetOfCodePoint[cps] = offset;
  }

  int toUtf16(int codePointIndex) {
    if (codePointIndex < 0) {
      return 0;
    }
    if (charOffsetOfCodePoint == null) {
      return Math.min(codePointIndex, length);
    }
    return charOffsetOfCodePoint[Math.min(codePointIndex, charOffsetOfCodePoint.length - 1)];
  }
}
