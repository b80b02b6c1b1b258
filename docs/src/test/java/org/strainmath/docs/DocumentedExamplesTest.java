package org.strainmath.docs;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.fail;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import jdk.jshell.JShell;
import jdk.jshell.Snippet;
import jdk.jshell.SnippetEvent;
import jdk.jshell.SourceCodeAnalysis;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.strainmath.quantity.Strain;

/**
 * Executes every fenced {@code java} block of {@code README.md} and {@code docs/*.md} in JShell,
 * one JShell per page so that a page's blocks build on each other as a reader's session does,
 * and compares what each block prints with the {@code text} block the page shows after it. The
 * README's demo command is checked the same way against {@link Demo}.
 */
class DocumentedExamplesTest {

    /** The docs module's folder (Surefire runs in it) and the repository above it. */
    private static final Path MODULE = Path.of("").toAbsolutePath();
    private static final Path REPOSITORY = MODULE.getParent();
    /** The JShell startup script of the guide. */
    private static final Path STARTUP = MODULE.resolve("jshell/strainmath.jsh");

    static Stream<Path> pages() throws IOException {
        List<Path> pages = new ArrayList<>();
        pages.add(REPOSITORY.resolve("README.md"));
        try (Stream<Path> guide = Files.list(MODULE)) {
            guide.filter(p -> p.toString().endsWith(".md")).sorted().forEach(pages::add);
        }
        return pages.stream();
    }

    @ParameterizedTest
    @MethodSource("pages")
    void everyJavaBlockRunsAndPrintsWhatThePageShows(Path page) throws Exception {
        List<MarkdownExamples.Block> blocks = MarkdownExamples.read(page);
        List<MarkdownExamples.Block> java = blocks.stream()
                .filter(b -> b.language().equals("java")).collect(Collectors.toList());
        if (java.isEmpty()) {
            return;
        }
        ByteArrayOutputStream buffer = new ByteArrayOutputStream();
        PrintStream capture = new PrintStream(buffer, true, StandardCharsets.UTF_8);
        PrintStream original = System.out;
        try (JShell shell = JShell.builder().executionEngine("local").out(capture).err(capture)
                .build()) {
            for (String entry : classPath()) {
                shell.addToClasspath(entry);
            }
            System.setOut(capture);
            String name = page.getFileName().toString();
            if (name.equals("jshell.md") || name.equals("getting-started.md")
                    || name.equals("conventions.md") || name.equals("real-time.md")) {
                // The pages type at the prompt the startup script prepares: run it first, as
                // jshell --startup does.
                run(shell, new MarkdownExamples.Block(STARTUP, 1, "java", Files.readString(STARTUP), null));
            }
            for (MarkdownExamples.Block block : java) {
                buffer.reset();
                run(shell, block);
                capture.flush();
                String printed = buffer.toString(StandardCharsets.UTF_8);
                if (block.hasExpectedOutput()) {
                    assertThat(printed).as("output of %s", block)
                            .isEqualTo(block.expectedOutput());
                }
            }
        } finally {
            System.setOut(original);
        }
    }

    @ParameterizedTest
    @MethodSource("pages")
    void theDemoPrintsWhatThePageShows(Path page) throws IOException {
        for (MarkdownExamples.Block block : MarkdownExamples.read(page)) {
            if (block.language().equals("bash") && block.code().contains("-Pdemo")
                    && block.hasExpectedOutput()) {
                ByteArrayOutputStream buffer = new ByteArrayOutputStream();
                Demo.run(new PrintStream(buffer, true, StandardCharsets.UTF_8));
                assertThat(buffer.toString(StandardCharsets.UTF_8)).as("demo output in %s", block)
                        .isEqualTo(block.expectedOutput());
            }
        }
    }

    private static void run(JShell shell, MarkdownExamples.Block block) {
        SourceCodeAnalysis analysis = shell.sourceCodeAnalysis();
        String rest = block.code();
        while (!rest.isBlank()) {
            SourceCodeAnalysis.CompletionInfo info = analysis.analyzeCompletion(rest);
            if (!info.completeness().isComplete()) {
                fail("%s: incomplete snippet: %s", block, rest.strip());
            }
            for (SnippetEvent event : shell.eval(info.source())) {
                if (event.status() == Snippet.Status.REJECTED) {
                    fail("%s: rejected: %s%n%s", block, event.snippet().source().strip(),
                            diagnostics(shell, event.snippet()));
                }
                if (event.exception() != null) {
                    fail("%s: threw %s in: %s", block, event.exception(),
                            event.snippet().source().strip());
                }
            }
            rest = info.remaining();
        }
    }

    private static String diagnostics(JShell shell, Snippet snippet) {
        return shell.diagnostics(snippet)
                .map(d -> d.getMessage(java.util.Locale.ROOT))
                .collect(Collectors.joining("\n"));
    }

    /** Where the library's classes are, as this test's JVM found them. */
    private static List<String> classPath() throws URISyntaxException {
        List<String> entries = new ArrayList<>();
        for (Class<?> type : new Class<?>[] {Strain.class, Demo.class,
            org.apache.kafka.streams.Topology.class, org.apache.kafka.common.serialization.Serde.class,
            org.apache.kafka.streams.TopologyTestDriver.class}) {
            entries.add(Path.of(type.getProtectionDomain().getCodeSource().getLocation().toURI())
                    .toString());
        }
        return entries;
    }
}
