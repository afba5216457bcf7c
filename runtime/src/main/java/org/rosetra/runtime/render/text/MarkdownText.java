package org.rosetra.runtime.render.text;

/**
 * Escapes text for Markdown (CommonMark with GitHub tables), so that a name such as
 * {@code web_top} or a label with {@code |} shows as written instead of turning into markup.
 */
public final class MarkdownText {

  /**
   * Characters that can start markup inside a line. Line-start markers (#, -, 1.) need no escape
   * because we only ever place text after a marker of our own or inside a table cell.
   */
  private static final String SPECIAL = "\\`*_[<>|~&";

  private MarkdownText() {}

  /** Backslash-escapes every character that Markdown could read as inline markup. */
  public static String escape(String text) {
    StringBuilder sb = new StringBuilder(text.length() + 8);
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (c == '\n' || c == '\r') {
        sb.append(' '); // a table cell or heading must stay on one line
      } else {
        if (SPECIAL.indexOf(c) >= 0) {
          sb.append('\\');
        }
        sb.append(c);
      }
    }
    return sb.toString();
  }

  /** A code span that holds {@code text} verbatim, with a fence longer than any backtick run in it. */
  public static String codeSpan(String text) {
    int longest = 0;
    int run = 0;
    for (int i = 0; i < text.length(); i++) {
      run = text.charAt(i) == '`' ? run + 1 : 0;
      longest = Math.max(longest, run);
    }
    String fence = "`".repeat(longest + 1);
    return fence + " " + text + " " + fence;
  }

  /** A fenced code block that holds {@code text} verbatim (the fence outruns any in the text). */
  public static String codeBlock(String text) {
    int longest = 2;
    int run = 0;
    for (int i = 0; i < text.length(); i++) {
      run = text.charAt(i) == '`' ? run + 1 : 0;
      longest = Math.max(longest, run);
    }
    String fence = "`".repeat(longest + 1);
    String body = text.endsWith("\n") ? text : text + "\n";
    return fence + "\n" + body + fence + "\n";
  }
}
