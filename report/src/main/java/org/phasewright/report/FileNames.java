package org.phasewright.report;

/** File-name pieces from model names: letters, digits, '_' and '-' stay, anything else becomes '_'. */
final class FileNames {
    private FileNames() {
    }

    static String safe(String name) {
        StringBuilder b = new StringBuilder();
        name.codePoints().forEach(c -> b.append(c < 128 && (Character.isLetterOrDigit(c) || c == '_' || c == '-')
                ? (char) c : '_'));
        return b.isEmpty() ? "_" : b.toString();
    }
}
