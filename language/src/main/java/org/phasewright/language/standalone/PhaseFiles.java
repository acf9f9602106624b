package org.phasewright.language.standalone;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.resource.XtextResourceSet;
import org.eclipse.xtext.util.CancelIndicator;
import org.eclipse.xtext.validation.CheckMode;
import org.eclipse.xtext.validation.IResourceValidator;
import org.eclipse.xtext.validation.Issue;
import org.phasewright.language.PhaseStandaloneSetup;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.text.LargeStackThreads;
import org.phasewright.language.text.LineBreaks;
import org.phasewright.language.validation.ExpressionDepth;

import com.google.inject.Injector;

/**
 * Reads `.phase` files outside any IDE: parse, link and validate, reporting every problem with its position.
 * One instance holds one Guice injector; it is cheap to reuse for many files.
 */
public final class PhaseFiles {
    private final Injector injector;

    /** Uses one injector per process: creating it (EMF registration, Guice) costs far more than a check. */
    public PhaseFiles() {
        this(SharedInjector.INSTANCE);
    }

    private static final class SharedInjector {
        static final Injector INSTANCE = new PhaseStandaloneSetup().createInjectorAndDoEMFRegistration();
    }

    public PhaseFiles(Injector injector) {
        this.injector = injector;
    }

    public Injector injector() {
        return injector;
    }

    /** Checks a file on disk; an unreadable file becomes a single error problem at 1:1. */
    public CheckedModel check(Path file) {
        String shown = file.toString();
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException | java.io.UncheckedIOException e) {
            String reason = Files.exists(file) ? "cannot be read (" + e.getClass().getSimpleName() + ")" : "not found";
            return new CheckedModel(shown, null,
                    List.of(new Problem(Problem.Severity.ERROR, shown, 1, 1, "File " + reason + ".", null)));
        }
        return check(shown, URI.createFileURI(file.toAbsolutePath().toString()), text);
    }

    /**
     * Checks text as if it were the file {@code shown}; {@code uri} must end in {@code .phase}. Runs on a thread with
     * a large stack so that deeply nested text is reported by the validator's depth rule instead of overflowing the
     * parser; a lone carriage return is read as a line break (the same length, so every offset stays valid; the
     * parser library's line counting fails on text that ends in one).
     */
    public CheckedModel check(String shown, URI uri, String text) {
        String normalized = LineBreaks.loneCrAsLf(text);
        CheckedModel[] result = new CheckedModel[1];
        Throwable[] failure = new Throwable[1];
        Thread worker = new LargeStackThreads("phase-check").newThread(() -> {
            try {
                result[0] = checkHere(shown, uri, normalized);
            } catch (RuntimeException | Error e) {
                failure[0] = e;
            }
        });
        worker.start();
        boolean interrupted = false;
        while (true) {
            try {
                worker.join();
                break;
            } catch (InterruptedException e) {
                interrupted = true;
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
        if (failure[0] instanceof RuntimeException e) {
            throw e;
        }
        if (failure[0] instanceof Error e) {
            throw e;
        }
        return result[0];
    }

    private CheckedModel checkHere(String shown, URI uri, String text) {
        XtextResourceSet resourceSet = injector.getInstance(XtextResourceSet.class);
        XtextResource resource = (XtextResource) resourceSet.createResource(uri);
        List<Issue> issues;
        try (InputStream in = new java.io.ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8))) {
            resource.load(in, Map.of(XtextResource.OPTION_ENCODING, "UTF-8"));
            issues = injector.getInstance(IResourceValidator.class).validate(resource, CheckMode.ALL,
                    CancelIndicator.NullImpl);
        } catch (IOException e) {
            return new CheckedModel(shown, null,
                    List.of(new Problem(Problem.Severity.ERROR, shown, 1, 1, "File cannot be parsed.", null)));
        } catch (StackOverflowError | org.eclipse.xtext.parser.ParseException e) {
            if (e instanceof org.eclipse.xtext.parser.ParseException && !causedByStackOverflow(e)) {
                throw e;
            }
            // Only absurd nesting gets here (thousands of levels): the validator reports depths above
            // ExpressionDepth.MAX_DEPTH, but the parser itself is recursive.
            return new CheckedModel(shown, null, List.of(new Problem(Problem.Severity.ERROR, shown, 1, 1,
                    "The file is nested too deeply to be read (parentheses, operators or calls thousands of levels"
                            + " deep); split long expressions into several `let` declarations.",
                    ExpressionDepth.TOO_DEEP)));
        }
        List<Problem> problems = new ArrayList<>();
        for (Issue issue : issues) {
            problems.add(toProblem(shown, issue));
        }
        problems.sort(Comparator.comparingInt(Problem::line).thenComparingInt(Problem::column));
        return new CheckedModel(shown, rootOf(resource), problems);
    }

    private static boolean causedByStackOverflow(Throwable e) {
        for (Throwable c = e; c != null && c.getCause() != c; c = c.getCause()) {
            if (c instanceof StackOverflowError) {
                return true;
            }
        }
        return false;
    }

    private static PhaseModel rootOf(Resource resource) {
        return resource.getContents().isEmpty() || !(resource.getContents().get(0) instanceof PhaseModel model)
                ? null
                : model;
    }

    private static Problem toProblem(String shown, Issue issue) {
        Problem.Severity severity = switch (issue.getSeverity()) {
            case ERROR -> Problem.Severity.ERROR;
            case WARNING -> Problem.Severity.WARNING;
            default -> Problem.Severity.INFO;
        };
        int line = issue.getLineNumber() == null ? 1 : issue.getLineNumber();
        int column = issue.getColumn() == null ? 1 : issue.getColumn();
        int offset = issue.getOffset() == null ? -1 : issue.getOffset();
        int length = issue.getLength() == null ? 0 : issue.getLength();
        return new Problem(severity, shown, line, column, issue.getMessage(), issue.getCode(), offset, length);
    }
}
