package org.phasewright.language.ide.quickfix;

import java.util.List;

import org.phasewright.language.ide.text.TextChange;

/** A proposed repair of one problem: a title for the menu and the text changes that carry it out. */
public record QuickFix(String title, List<TextChange> changes) {

    public QuickFix {
        changes = List.copyOf(changes);
    }
}
