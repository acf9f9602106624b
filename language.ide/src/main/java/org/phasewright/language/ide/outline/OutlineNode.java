package org.phasewright.language.ide.outline;

import java.util.List;

/**
 * One outline entry: a label and a short detail, the whole declaration ({@code offset}, {@code length}) and the part
 * to select when jumping to it ({@code nameOffset}, {@code nameLength}), with nested entries.
 */
public record OutlineNode(String name, OutlineKind kind, String detail, int offset, int length, int nameOffset,
        int nameLength, List<OutlineNode> children) {

    public OutlineNode {
        children = List.copyOf(children);
    }
}
