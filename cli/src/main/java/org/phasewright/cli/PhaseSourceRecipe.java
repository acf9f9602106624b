package org.phasewright.cli;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

import org.eclipse.emf.common.util.URI;
import org.phasewright.language.lowering.LoweringException;
import org.phasewright.language.lowering.ModelLowering;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.PhaseFiles;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.ensemble.ModelRecipe;

/**
 * A model as Spark executors rebuild it: the text of the `.phase` file and its name, parsed, lowered and compiled
 * on the executor (once per JVM: the executor caches by {@link #key()}).
 */
record PhaseSourceRecipe(String fileName, String text) implements ModelRecipe {

    @Override
    public String key() {
        try {
            MessageDigest sha = MessageDigest.getInstance("SHA-256");
            sha.update(fileName.getBytes(StandardCharsets.UTF_8));
            sha.update((byte) 0);
            return HexFormat.of().formatHex(sha.digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every JDK has SHA-256", e);
        }
    }

    @Override
    public CompiledModel compile() {
        CheckedModel checked = new PhaseFiles().check(fileName, URI.createFileURI("/recipe/" + fileName), text);
        if (checked.hasErrors() || checked.ast() == null) {
            throw new IllegalStateException(fileName + " has errors on the Spark executor");
        }
        try {
            return ModelCompiler.compile(new ModelLowering().lower(checked.ast()));
        } catch (LoweringException e) {
            throw new IllegalStateException(fileName + " cannot be lowered on the Spark executor: " + e.getMessage());
        }
    }
}
