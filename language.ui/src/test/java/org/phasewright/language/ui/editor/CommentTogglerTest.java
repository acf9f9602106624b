package org.phasewright.language.ui.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.eclipse.jface.text.Document;
import org.junit.jupiter.api.Test;

class CommentTogglerTest {

    @Test
    void commentsEveryLineOfTheSelectionThenUncommentsThem() throws Exception {
        String original = "rate x = v\n\n  rate v = -x\nstudy s { equilibria }\n";
        Document document = new Document(original);
        int length = original.indexOf("study") - 1;
        CommentToggler.toggle(document, 0, length);
        assertEquals("// rate x = v\n\n//   rate v = -x\nstudy s { equilibria }\n", document.get());
        CommentToggler.toggle(document, 0, document.get().indexOf("study") - 1);
        assertEquals(original, document.get());
    }

    @Test
    void aMixedSelectionIsCommentedNotUncommented() throws Exception {
        Document document = new Document("// rate x = v\nrate v = -x\n");
        CommentToggler.toggle(document, 0, document.getLength());
        assertEquals("// // rate x = v\n// rate v = -x\n", document.get());
    }

    @Test
    void theCaretAloneTogglesItsLine() throws Exception {
        Document document = new Document("state x = 1\nstate v = 0\n");
        CommentToggler.toggle(document, document.get().indexOf("v ="), 0);
        assertEquals("state x = 1\n// state v = 0\n", document.get());
    }
}
