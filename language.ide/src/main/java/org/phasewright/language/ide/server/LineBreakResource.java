package org.phasewright.language.ide.server;

import java.io.IOException;
import java.io.InputStream;
import java.io.Reader;
import java.io.StringReader;

import org.eclipse.xtext.linking.lazy.LazyLinkingResource;
import org.phasewright.language.text.LineBreaks;

import com.google.common.io.CharStreams;

/**
 * The language's resource in the editors and the server, reading a lone CR as LF ({@link LineBreaks}) as
 * {@code phasewright check} does. Open documents arrive so already ({@link PhaseWorkspaceManager}); this covers
 * files the server loads from disk, where Xtext's line counting threw on text ending in a lone CR and the syntax
 * error was lost.
 */
public class LineBreakResource extends LazyLinkingResource {

    @Override
    protected Reader createReader(InputStream inputStream) throws IOException {
        try (Reader reader = super.createReader(inputStream)) {
            return new StringReader(LineBreaks.loneCrAsLf(CharStreams.toString(reader)));
        }
    }
}
