package org.rosetra.lang.repl;

import java.util.ArrayDeque;
import java.util.Deque;

/** Reads enough of the text before a cursor to know which block, if any, it stands in. */
final class OpenBlock {
    private OpenBlock() {
    }

    /**
     * The keyword of the innermost block left open in {@code text} ("rosette", "case", ...),
     * "java" inside a Java body, or null outside every block. Strings and comments are skipped.
     */
    static String kindAt(String text) {
        Deque<String> open = new ArrayDeque<>();
        int lineStart = 0;
        boolean inString = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (inString) {
                if (c == '\\') {
                    i++;
                } else if (c == '"' || c == '\n') {
                    inString = false;
                }
                continue;
            }
            if (c == '"' && !"java".equals(open.peek())) {
                inString = true;
            } else if (c == '#' && !"java".equals(open.peek())) {
                int next = text.indexOf('\n', i);
                i = next < 0 ? text.length() : next - 1;
            } else if (c == '\n') {
                lineStart = i + 1;
            } else if (c == '{') {
                open.push(kindOf(text.substring(lineStart, i), open.peek()));
            } else if (c == '}' && !open.isEmpty()) {
                open.pop();
            }
        }
        return open.peek();
    }

    /** A brace inside Java stays Java; after "java" it starts Java; else the line's first word. */
    private static String kindOf(String lineBeforeBrace, String enclosing) {
        if ("java".equals(enclosing) || lineBeforeBrace.stripTrailing().endsWith("java")) {
            return "java";
        }
        String[] words = lineBeforeBrace.strip().split("\\s+");
        return words.length == 0 || words[0].isEmpty() ? "block" : words[0];
    }

    /** The name before the dot at {@code dot}, skipping a case index: {@code web_top[proof].}. */
    static String wordBeforeDot(String text, int dot) {
        int end = dot;
        if (end > 0 && text.charAt(end - 1) == ']') {
            int open = text.lastIndexOf('[', end - 1);
            end = open < 0 ? end : open;
        }
        int start = end;
        while (start > 0 && ScriptCompleter.isWordChar(text.charAt(start - 1))) {
            start--;
        }
        return text.substring(start, end);
    }
}
