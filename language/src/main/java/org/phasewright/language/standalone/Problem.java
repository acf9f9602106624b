package org.phasewright.language.standalone;

/**
 * One diagnostic of a `.phase` file with a 1-based line and column, ready to print as
 * {@code file:line:column: severity: message}.
 */
public record Problem(Severity severity, String file, int line, int column, String message, String code) {

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
