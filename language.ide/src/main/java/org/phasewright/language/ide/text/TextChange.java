package org.phasewright.language.ide.text;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Replace {@code length} characters at {@code offset} (0-based, in UTF-16 units of the document text) by
 * {@code text}. The common currency of quick fixes and formatting, free of any editor API.
 */
public record TextChange(int offset, int length, String text) {

    public TextChange {
        if (offset < 0 || length < 0 || text == null) {
            throw new IllegalArgumentException("bad text change " + offset + "+" + length);
        }
    }

    public static TextChange insert(int offset, String text) {
        return new TextChange(offset, 0, text);
    }

    /** Applies non-overlapping changes, given in any order, to {@code original}. */
    public static String apply(String original, List<TextChange> changes) {
        List<TextChange> sorted = new ArrayList<>(changes);
        sorted.sort(Comparator.comparingInt(TextChange::offset).reversed());
        StringBuilder result = new StringBuilder(original);
        int limit = original.length();
        for (TextChange change : sorted) {
            if (change.offset() + change.length() > limit) {
                throw new IllegalArgumentException("overlapping or out-of-range text changes");
            }
            result.replace(change.offset(), change.offset() + change.length(), change.text());
            limit = change.offset();
        }
        return result.toString();
    }
}
