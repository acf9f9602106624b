package org.phasewright.language.ui;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import java.util.Objects;

import org.eclipse.emf.common.util.URI;
import org.eclipse.xtext.EcoreUtil2;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.resource.XtextResourceSet;
import org.eclipse.xtext.util.CancelIndicator;
import org.phasewright.language.ide.PhaseIdeSetup;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.PhaseFiles;

import com.google.inject.Injector;

/**
 * The language services of this plugin: one Guice injector (runtime + UI-neutral IDE bindings) created on first use
 * and shared by the editor, the builder and the quick fixes.
 */
public final class PhaseLanguage {
    private static volatile PhaseLanguage instance;

    private final Injector injector;
    private final PhaseFiles files;

    private PhaseLanguage(Injector injector) {
        this.injector = injector;
        this.files = new PhaseFiles(injector);
    }

    public static PhaseLanguage get() {
        PhaseLanguage local = instance;
        if (local == null) {
            synchronized (PhaseLanguage.class) {
                local = instance;
                if (local == null) {
                    local = new PhaseLanguage(createInjector());
                    instance = local;
                }
            }
        }
        return local;
    }

    /** Xtext looks classes up by the thread's context loader in places; inside OSGi that must be our bundle's. */
    private static Injector createInjector() {
        Thread thread = Thread.currentThread();
        ClassLoader previous = thread.getContextClassLoader();
        thread.setContextClassLoader(PhaseLanguage.class.getClassLoader());
        try {
            return new PhaseIdeSetup().createInjectorAndDoEMFRegistration();
        } finally {
            thread.setContextClassLoader(previous);
        }
    }

    public Injector injector() {
        return injector;
    }

    /** Parses and links {@code text} without validating it: enough for completion and hovers. */
    public XtextResource parse(String path, String text) {
        XtextResourceSet resourceSet = injector.getInstance(XtextResourceSet.class);
        // An in-memory URI: the text may differ from the file on disk, and scoping must not read the disk copy.
        String name = java.nio.file.Path.of(phasePath(path)).getFileName().toString();
        XtextResource resource = (XtextResource) resourceSet.createResource(URI.createURI("synthetic:/" + name));
        try {
            resource.load(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)),
                    Map.of(XtextResource.OPTION_ENCODING, "UTF-8"));
        } catch (IOException e) {
            throw new UncheckedIOException(e); // reading from memory does not fail
        }
        EcoreUtil2.resolveLazyCrossReferences(resource, CancelIndicator.NullImpl);
        return resource;
    }

    private static String phasePath(String path) {
        return path.endsWith(".phase") ? path : path + ".phase";
    }

    /** Parses and validates {@code text}; {@code shown} is the name used in messages, {@code path} any .phase path. */
    public CheckedModel check(String shown, String path, String text) {
        Objects.requireNonNull(text, "text");
        return files.check(shown, URI.createFileURI(phasePath(path)), text);
    }
}
