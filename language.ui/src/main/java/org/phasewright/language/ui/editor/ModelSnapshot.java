package org.phasewright.language.ui.editor;

import org.phasewright.language.standalone.CheckedModel;

/** The editor text as last parsed in the background, with what the checker made of it. */
public record ModelSnapshot(String text, CheckedModel checked) {
}
