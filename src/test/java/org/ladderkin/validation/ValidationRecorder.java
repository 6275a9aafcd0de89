package org.ladderkin.validation;

import java.lang.reflect.Method;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ConcurrentLinkedQueue;
import org.junit.jupiter.api.extension.AfterTestExecutionCallback;
import org.junit.jupiter.api.extension.BeforeTestExecutionCallback;
import org.junit.jupiter.api.extension.ExtensionContext;

/**
 * Collects the comparisons of every {@link CheckedAgainst} test. {@link DossierWriter} turns them into the
 * validation table when the test run ends.
 */
public final class ValidationRecorder implements BeforeTestExecutionCallback, AfterTestExecutionCallback {

    /** One comparison inside a test. */
    public record Comparison(String quantity, double value, double reference, double tolerance, boolean relative,
                             boolean passed) {
    }

    /** One finished validation test with its comparisons. */
    public record Entry(String testClass, String testMethod, String displayName, CheckedAgainst annotation,
                        List<Comparison> comparisons, boolean passed) {
    }

    static final ConcurrentLinkedQueue<Entry> ENTRIES = new ConcurrentLinkedQueue<>();
    private static final ThreadLocal<List<Comparison>> CURRENT = new ThreadLocal<>();

    static void record(Comparison c) {
        List<Comparison> list = CURRENT.get();
        if (list == null) {
            throw new IllegalStateException("Reference.check called outside a test annotated with @CheckedAgainst");
        }
        list.add(c);
    }

    @Override
    public void beforeTestExecution(ExtensionContext context) {
        CURRENT.set(new ArrayList<>());
    }

    @Override
    public void afterTestExecution(ExtensionContext context) {
        List<Comparison> comparisons = CURRENT.get();
        CURRENT.remove();
        Method m = context.getRequiredTestMethod();
        CheckedAgainst a = m.getAnnotation(CheckedAgainst.class);
        if (a == null) {
            return;
        }
        String display = context.getDisplayName();
        ENTRIES.add(new Entry(context.getRequiredTestClass().getName(), m.getName(), display, a,
                List.copyOf(comparisons == null ? List.of() : comparisons), context.getExecutionException().isEmpty()));
    }
}
