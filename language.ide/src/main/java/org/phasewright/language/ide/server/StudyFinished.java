package org.phasewright.language.ide.server;

/**
 * Parameters of the {@value PhaseLanguageServer#STUDY_FINISHED} notification, sent after a saved model's studies ran
 * (or could not run). {@code status} is {@code finished}, {@code failed} or {@code not-run}; {@code resultsFolder}
 * is the URI of {@code <file>.results} beside the model when it exists, else null.
 */
public record StudyFinished(String uri, String status, String message, String resultsFolder, long millis) {
}
