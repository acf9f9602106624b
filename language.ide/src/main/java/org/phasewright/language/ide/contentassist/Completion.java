package org.phasewright.language.ide.contentassist;

/**
 * One content-assist proposal: insert {@code text} in place of the {@code replaceLength} characters before the
 * caret that were already typed; {@code label} and {@code detail} are for the list, {@code kind} for an icon.
 */
public record Completion(String label, String text, int replaceOffset, int replaceLength, Kind kind, String detail) {

    public enum Kind {
        KEYWORD, STATE_OR_TIME, PARAM, LET, FUNCTION, UNIT, OTHER
    }
}
