package org.counterpoise;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Predicate;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The layering rules of DEVELOPERS.md, checked on the source text of src/main/java: the import
 * lines, every qualified name written inline in code, the order of the packages inside
 * {@code core}, and the length of classes. Comments and string literals are blanked before a rule
 * reads the code, so a javadoc {@code {@link org.counterpoise.core.model.Structure}} is allowed
 * (it is documentation and makes no dependency the compiler sees), while the same name in code is
 * not. Each failure names the file, the line and the rule it breaks.
 */
class ArchitectureTest {
    private static final Path MAIN = Path.of("src/main/java");
    private static final Path ROOT = MAIN.resolve("org/counterpoise");
    private static final String CORE = "org.counterpoise.core.";

    /**
     * The order inside {@code core}: a package may import only core packages of a lower layer.
     * Packages on the same layer do not import each other. A new core package must be placed here.
     * ({@code progress}, the progress listener, and {@code system}, the interfaces a model of
     * several modes will implement, arrive from other branches of this session; an entry for a
     * package that does not exist checks nothing.)
     */
    private static final Map<String, Integer> CORE_LAYERS = Map.ofEntries(
            Map.entry("error", 0),
            Map.entry("rational", 1), Map.entry("units", 1), Map.entry("progress", 1),
            Map.entry("model", 2),
            Map.entry("system", 3), Map.entry("identify", 3),
            Map.entry("response", 4),
            Map.entry("tuning", 5), Map.entry("remedy", 5), Map.entry("runup", 5), Map.entry("robust", 5),
            Map.entry("criteria", 5),
            Map.entry("optim", 6),
            Map.entry("design", 7),
            Map.entry("realisation", 8),
            Map.entry("commission", 9));

    /** The only things core code may import (the numerical core is pure: java.* and Commons Math). */
    private static final List<String> CORE_MAY_IMPORT = List.of("java.", "org.apache.commons.math3.", CORE);

    /** JDK parts core must not reach even though they start with {@code java.}: screens, preferences, disk. */
    private static final List<String> CORE_MAY_NOT_IMPORT = List.of("java.awt", "java.util.prefs", "java.io.File",
            "java.nio.file");

    private static final int LONGEST_CLASS = 400;
    private static final String LONG_CLASS_NOTE = "Longer than 400 lines because";

    /**
     * A qualified type name written in code: package segments in lower case, then a type. The roots
     * are the JDK and every library the program uses, and the program itself.
     */
    private static final Pattern INLINE_NAME = Pattern.compile(
            "(?<![\\w.])((?:org\\.counterpoise|javax?|org\\.knowm|org\\.apache|com\\.google|com\\.formdev|picocli)"
                    + "(?:\\.[a-z][a-z0-9_]*)*)\\.[A-Z]\\w*");

    /** One source file: its lines as written and the same lines with comments and literals blanked. */
    private record Source(Path path, String name, String packageName, List<String> lines, List<String> code) {
        String where(int index) {
            return name + ":" + (index + 1);
        }
    }

    private static List<Source> sources(String under) {
        try (Stream<Path> files = Files.walk(ROOT.resolve(under))) {
            List<Source> out = new ArrayList<>();
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).sorted().toList()) {
                String text = Files.readString(f);
                String name = MAIN.relativize(f).toString().replace('\\', '/');
                String pkg = name.substring(0, name.lastIndexOf('/')).replace('/', '.');
                out.add(new Source(f, name, pkg, text.lines().toList(), blankCommentsAndLiterals(text).lines().toList()));
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * The source with every comment, string, text block and character literal replaced by spaces
     * (line breaks kept, so line numbers stay true).
     */
    static String blankCommentsAndLiterals(String s) {
        StringBuilder out = new StringBuilder(s);
        int i = 0;
        int n = s.length();
        while (i < n) {
            int end;
            if (s.startsWith("//", i)) {
                end = s.indexOf('\n', i);
                end = end < 0 ? n : end;
            } else if (s.startsWith("/*", i)) {
                end = s.indexOf("*/", i + 2);
                end = end < 0 ? n : end + 2;
            } else if (s.startsWith("\"\"\"", i)) {
                end = s.indexOf("\"\"\"", i + 3);
                end = end < 0 ? n : end + 3;
            } else if (s.charAt(i) == '"' || s.charAt(i) == '\'') {
                char quote = s.charAt(i);
                end = i + 1;
                while (end < n && s.charAt(end) != quote && s.charAt(end) != '\n') {
                    end += s.charAt(end) == '\\' ? 2 : 1;
                }
                end = Math.min(n, end + 1);
            } else {
                i++;
                continue;
            }
            for (int k = i; k < end; k++) {
                if (out.charAt(k) != '\n') {
                    out.setCharAt(k, ' ');
                }
            }
            i = end;
        }
        return out.toString();
    }

    /** Every import in {@code under} that starts with one of the forbidden prefixes, with the rule named. */
    private static List<String> importsOf(String under, String rule, String... forbidden) {
        return importsWhere(under, rule, imported -> Stream.of(forbidden).anyMatch(imported::startsWith));
    }

    private static List<String> importsWhere(String under, String rule, Predicate<String> bad) {
        List<String> out = new ArrayList<>();
        for (Source s : sources(under)) {
            for (int i = 0; i < s.code().size(); i++) {
                String t = s.code().get(i).strip();
                if (t.startsWith("import ")) {
                    String imported = t.substring("import ".length()).replace("static ", "").replace(";", "").strip();
                    if (bad.test(imported)) {
                        out.add(s.where(i) + ": " + rule + ": import " + imported);
                    }
                }
            }
        }
        return out;
    }

    @Test
    void coreImportsOnlyJavaAndCommonsMath() {
        assertEquals(List.of(), importsWhere("core",
                "core imports only java.* (not screens, preferences or files) and Commons Math",
                imported -> CORE_MAY_IMPORT.stream().noneMatch(imported::startsWith)
                        || CORE_MAY_NOT_IMPORT.stream().anyMatch(imported::startsWith)));
    }

    @Test
    void coreImportsNoUserInterfaceFileOrDocumentLibrary() {
        assertEquals(List.of(), importsOf("core", "core imports no Swing, AWT, XChart, PDFBox, Gson or picocli",
                "java.awt", "javax.swing", "org.knowm", "org.apache.pdfbox", "com.google.gson", "picocli",
                "org.counterpoise.io", "org.counterpoise.ui"));
    }

    @Test
    void corePackagesImportOnlyLowerLayers() {
        List<String> out = new ArrayList<>();
        for (Source s : sources("core")) {
            String own = s.packageName().substring(CORE.length()).split("\\.")[0];
            Integer ownLayer = CORE_LAYERS.get(own);
            if (ownLayer == null) {
                continue; // reported once for the package by everyCorePackageSaysWhatItHoldsAndMayUse
            }
            for (int i = 0; i < s.code().size(); i++) {
                String t = s.code().get(i).strip();
                if (!t.startsWith("import ")) {
                    continue;
                }
                String imported = t.substring("import ".length()).replace("static ", "").strip();
                if (!imported.startsWith(CORE)) {
                    continue;
                }
                String other = imported.substring(CORE.length()).split("\\.")[0];
                Integer otherLayer = CORE_LAYERS.get(other);
                if (!other.equals(own) && (otherLayer == null || otherLayer >= ownLayer)) {
                    out.add(s.where(i) + ": core." + own + " (layer " + ownLayer + ") may import only core packages"
                            + " of a lower layer, not core." + other + " (layer " + otherLayer + ")");
                }
            }
        }
        assertEquals(List.of(), out);
    }

    @Test
    void everyCorePackageSaysWhatItHoldsAndMayUse() throws IOException {
        List<String> out = new ArrayList<>();
        try (Stream<Path> dirs = Files.list(ROOT.resolve("core"))) {
            for (Path dir : dirs.filter(Files::isDirectory).sorted().toList()) {
                String own = dir.getFileName().toString();
                if (!CORE_LAYERS.containsKey(own)) {
                    out.add("org/counterpoise/core/" + own + ":1: core package '" + own
                            + "' has no place in CORE_LAYERS of ArchitectureTest");
                }
                if (!Files.isRegularFile(dir.resolve("package-info.java"))) {
                    out.add("org/counterpoise/core/" + own + ":1: a core package has a package-info.java saying what"
                            + " it holds and which core packages it may use");
                }
            }
        }
        assertEquals(List.of(), out);
    }

    @Test
    void ioImportsNoSwingAndNoUserInterface() {
        assertEquals(List.of(), importsOf("io", "io imports no Swing and nothing of ui", "javax.swing",
                "org.knowm.xchart.XChartPanel", "org.counterpoise.ui"));
    }

    @Test
    void commandLineImportsNoSwing() {
        assertEquals(List.of(), importsOf("ui/cli", "the command line imports no Swing and nothing of the GUI",
                "javax.swing", "java.awt", "org.counterpoise.ui.gui"));
    }

    @Test
    void documentModelImportsNoSwing() {
        assertEquals(List.of(), importsOf("ui/gui/document",
                "the document model (project, dirty flag, undo) imports no Swing or AWT", "javax.swing", "java.awt"));
    }

    @Test
    void noQualifiedNameWrittenInlineInCode() {
        List<String> out = new ArrayList<>();
        for (Source s : sources("")) {
            for (int i = 0; i < s.code().size(); i++) {
                String t = s.code().get(i).strip();
                if (t.startsWith("import ") || t.startsWith("package ")) {
                    continue;
                }
                Matcher m = INLINE_NAME.matcher(t);
                while (m.find()) {
                    out.add(s.where(i) + ": import the type instead of writing its full name inline: " + m.group());
                }
            }
        }
        assertEquals(List.of(), out);
    }

    @Test
    void longClassesSayWhy() {
        List<String> out = new ArrayList<>();
        for (Source s : sources("")) {
            if (s.lines().size() > LONGEST_CLASS && !topOf(s).contains(LONG_CLASS_NOTE)) {
                out.add(s.name() + ":1: " + s.lines().size() + " lines; split it, or say at its top \""
                        + LONG_CLASS_NOTE + " ...\"");
            }
        }
        assertEquals(List.of(), out);
    }

    /** The text before the first type declaration: the imports and the class's javadoc. */
    private static String topOf(Source s) {
        StringBuilder top = new StringBuilder();
        for (int i = 0; i < s.lines().size(); i++) {
            if (s.code().get(i).matches(".*\\b(class|record|enum|interface)\\s+\\w+.*")) {
                break;
            }
            top.append(s.lines().get(i).replaceFirst("^\\s*\\*", "").strip()).append(' ');
        }
        return top.toString();
    }

    @Test
    void theBlankingKeepsCodeAndLineBreaksAndHidesCommentsAndLiterals() {
        String code = "int a = 1; // org.counterpoise.X\n/** {@link java.awt.Color}\n */ String s = \"java.awt.Color\";"
                + " char c = '\\''; javax.swing.JLabel l;";
        String blank = blankCommentsAndLiterals(code);
        assertEquals(code.length(), blank.length());
        assertEquals(3, blank.lines().count());
        assertTrue(blank.startsWith("int a = 1; "));
        Matcher m = INLINE_NAME.matcher(blank);
        assertTrue(m.find());
        assertEquals("javax.swing.JLabel", m.group());
        assertTrue(!m.find(), blank);
    }
}
