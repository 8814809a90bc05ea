package org.counterpoise;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The layering rules of DEVELOPERS.md, checked on the import lines of src/main/java and on every
 * fully qualified name written inline in code (outside comments and string literals), which
 * would otherwise slip past an import rule.
 */
class ArchitectureTest {
    private static final Path ROOT = Path.of("src/main/java/org/counterpoise");
    private static final Pattern STRING_LITERAL = Pattern.compile("\"(?:[^\"\\\\]|\\\\.)*\"");

    private static List<String> violations(String layer, String... forbidden) throws IOException {
        List<String> out = new ArrayList<>();
        try (Stream<Path> files = Files.walk(ROOT.resolve(layer))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                for (String line : Files.readAllLines(f)) {
                    String t = line.strip();
                    if (t.startsWith("//") || t.startsWith("*") || t.startsWith("/*")) {
                        continue;
                    }
                    boolean isImport = t.startsWith("import ");
                    String code = codeOf(t);
                    for (String bad : forbidden) {
                        if (isImport ? t.startsWith("import " + bad) || t.startsWith("import static " + bad)
                                : usesInline(code, bad)) {
                            out.add(f + ": " + t);
                        }
                    }
                }
            }
        }
        return out;
    }

    /** The line without string literals and without a trailing comment. */
    private static String codeOf(String line) {
        String code = STRING_LITERAL.matcher(line).replaceAll("\"\"");
        int comment = code.indexOf("//");
        return comment < 0 ? code : code.substring(0, comment);
    }

    /** True when a qualified name starting with {@code prefix} is written in the code. */
    private static boolean usesInline(String code, String prefix) {
        int at = code.indexOf(prefix);
        while (at >= 0) {
            boolean startsName = at == 0 || !(Character.isJavaIdentifierPart(code.charAt(at - 1))
                    || code.charAt(at - 1) == '.');
            int end = at + prefix.length();
            boolean continues = end < code.length() && (code.charAt(end) == '.' || prefix.endsWith(".")
                    || Character.isUpperCase(prefix.charAt(prefix.lastIndexOf('.') + 1)));
            if (startsName && continues) {
                return true;
            }
            at = code.indexOf(prefix, at + 1);
        }
        return false;
    }

    @Test
    void coreImportsNoUserInterfaceFileOrDocumentCode() throws IOException {
        assertEquals(List.of(), violations("core", "java.awt", "javax.swing", "java.util.prefs", "com.google.gson",
                "org.knowm", "org.apache.pdfbox", "picocli", "org.counterpoise.io", "org.counterpoise.ui",
                "java.io.File", "java.nio.file"));
    }

    @Test
    void ioImportsNoSwingAndNoUserInterface() throws IOException {
        assertEquals(List.of(), violations("io", "javax.swing", "org.knowm.xchart.XChartPanel", "org.counterpoise.ui"));
    }

    @Test
    void nothingOutsideTheUserInterfaceImportsIt() throws IOException {
        assertEquals(List.of(), violations("core", "org.counterpoise.ui"));
        assertEquals(List.of(), violations("io", "org.counterpoise.ui"));
    }

    @Test
    void commandLineImportsNoSwing() throws IOException {
        assertEquals(List.of(), violations("ui/cli", "javax.swing", "org.counterpoise.ui.gui"));
    }
}
