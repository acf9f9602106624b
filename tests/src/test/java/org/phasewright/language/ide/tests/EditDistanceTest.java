package org.phasewright.language.ide.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.phasewright.language.ide.quickfix.EditDistance;

/** The distance behind "did you mean" quick fixes, against published worked examples. */
class EditDistanceTest {

    @Test
    void levenshteinTextbookExample() {
        // kitten -> sitting: two substitutions and one insertion (the standard example, e.g. Wikipedia,
        // "Levenshtein distance"; also Jurafsky & Martin, Speech and Language Processing, ch. 2, for the method).
        assertEquals(3, EditDistance.between("kitten", "sitting"));
        assertEquals(3, EditDistance.between("sitting", "kitten"));
    }

    @Test
    void swapOfNeighboursCountsOnce() {
        // Damerau (1964), "A technique for computer detection and correction of spelling errors": a transposition
        // of adjacent letters is one error.
        assertEquals(1, EditDistance.between("ab", "ba"));
        assertEquals(1, EditDistance.between("growht", "growth"));
    }

    @Test
    void optimalStringAlignmentDoesNotEditASubstringTwice() {
        // OSA("CA", "ABC") = 3, whereas the unrestricted Damerau-Levenshtein distance is 2 (Wikipedia,
        // "Damerau-Levenshtein distance", optimal string alignment distance).
        assertEquals(3, EditDistance.between("CA", "ABC"));
    }

    @Test
    void emptyWord() {
        assertEquals(0, EditDistance.between("", ""));
        assertEquals(4, EditDistance.between("", "flux"));
    }
}
