package org.phasewright.language.standalone;

/**
 * One diagnostic of a `.phase` file with a 1-based line and column, ready to print as
 * {@code file:line:column: severity: message}. Editors also get the exact range: a 0-based character
 * {@code offset} and {@code length} ({@code offset} is -1 when unknown).
 */
public record Problem(Severity severity, String file, int line, int column, String message, String code, int offset,
        int length) {

    /** A problem without a known character range. */
    public Problem(Severity severity, String file, int line, int column, String message, String code) {
        this(severity, file, line, column, message, code, -1, 0);
    }

    public enum Severity {
        ERROR, WARNING, INFO;

        public String word() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    public boolean isError() {
        return severity == Severity.ERROR;
    }

    @Override
    public String toString() {
        return file + ":" + line + ":" + column + ": " + severity.word() + ": " + message;
    }
}
