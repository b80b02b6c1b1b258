package org.strainmath.docs;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The fenced code blocks of a Markdown page, each with the {@code text} block that follows it
 * (its expected output), if any. Only blank lines may stand between a block and its output.
 */
final class MarkdownExamples {

    /** One fenced block: its language tag, its code, and the output the page shows for it. */
    record Block(Path page, int line, String language, String code, String expectedOutput) {

        boolean hasExpectedOutput() {
            return expectedOutput != null;
        }

        @Override
        public String toString() {
            return page.getFileName() + ":" + line + " (" + language + ")";
        }
    }

    private MarkdownExamples() {
    }

    static List<Block> read(Path page) throws IOException {
        List<String> lines = Files.readAllLines(page);
        List<String[]> fences = new ArrayList<>(); // language, code, start line, end line
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i);
            if (line.startsWith("```")) {
                String language = line.substring(3).trim();
                StringBuilder code = new StringBuilder();
                int start = i + 1;
                i++;
                while (i < lines.size() && !lines.get(i).startsWith("```")) {
                    code.append(lines.get(i)).append('\n');
                    i++;
                }
                fences.add(new String[] {language, code.toString(), Integer.toString(start),
                    Integer.toString(i)});
            }
        }
        List<Block> blocks = new ArrayList<>();
        for (int f = 0; f < fences.size(); f++) {
            String[] fence = fences.get(f);
            if (fence[0].equals("text")) {
                continue;
            }
            String expected = null;
            if (f + 1 < fences.size() && fences.get(f + 1)[0].equals("text")
                    && onlyBlankBetween(lines, Integer.parseInt(fence[3]) + 1,
                            Integer.parseInt(fences.get(f + 1)[2]) - 1)) {
                expected = fences.get(f + 1)[1];
            }
            blocks.add(new Block(page, Integer.parseInt(fence[2]), fence[0], fence[1], expected));
        }
        return blocks;
    }

    private static boolean onlyBlankBetween(List<String> lines, int from, int toExclusive) {
        for (int i = from; i < toExclusive; i++) {
            if (!lines.get(i).isBlank()) {
                return false;
            }
        }
        return true;
    }
}
