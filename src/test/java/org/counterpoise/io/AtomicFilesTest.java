package org.counterpoise.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.net.StandardProtocolFamily;
import java.net.UnixDomainSocketAddress;
import java.nio.channels.ServerSocketChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Safe writes: what is on the disk after a failure, a refusal or a success. Failures are
 * injected at the stream that reaches the disk (as a full disk shows itself to Java: an
 * IOException whose text is the system's "No space left on device") and before a rename.
 * The expectations are common practice for safe saves (temporary file, flush, rename).
 */
class AtomicFilesTest {
    /** A Java class name such as java.nio.file.NoSuchFileException must never reach a user. */
    private static final Pattern CLASS_NAME = Pattern.compile("\\b[a-z]+(\\.[a-z]+)*\\.[A-Z]\\w*(Exception|Error)\\b");

    @Test
    void replacesContentAndKeepsTheOldFilePermissions(@TempDir Path dir) throws IOException {
        assumeTrue(posix(dir));
        Path fresh = dir.resolve("new.json");
        AtomicFiles.write(fresh, text("one"));
        assertEquals("one", Files.readString(fresh));
        assertEquals("rw-r--r--", PosixFilePermissions.toString(Files.getPosixFilePermissions(fresh)));

        Path kept = dir.resolve("kept.json");
        Files.writeString(kept, "old");
        Files.setPosixFilePermissions(kept, PosixFilePermissions.fromString("rw-rw----"));
        AtomicFiles.write(kept, out -> {
            out.write("new".getBytes(StandardCharsets.UTF_8));
            out.close(); // a body may close its stream; the file is still flushed and renamed
        });
        assertEquals("new", Files.readString(kept));
        assertEquals("rw-rw----", PosixFilePermissions.toString(Files.getPosixFilePermissions(kept)));
        assertEquals(List.of("kept.json", "new.json"), names(dir));
    }

    @ParameterizedTest
    @ValueSource(ints = {0, 1, 5000, 70_000, 300_000})
    void aFullDiskLeavesTheOldFileAndNoTemporaryFile(int bytesBeforeFull, @TempDir Path dir) throws IOException {
        Path target = dir.resolve("pump skid.json");
        Files.writeString(target, "the old project");
        FileWriteException e = assertThrows(FileWriteException.class,
                () -> AtomicFiles.writeAll(List.of(new AtomicFiles.Entry(target, bigBody(400_000))),
                        fullAfter(bytesBeforeFull, -1)));
        assertEquals(target + " cannot be written here (the disk is full); nothing was changed", e.getMessage());
        assertPlain(e.getMessage());
        assertEquals("the old project", Files.readString(target));
        assertEquals(List.of("pump skid.json"), names(dir));
    }

    @Test
    void aFailingBodyLeavesNothingBehind(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("sheet.pdf");
        assertThrows(IllegalStateException.class, () -> AtomicFiles.write(target, out -> {
            out.write(new byte[1000]);
            throw new IllegalStateException("chart library failed");
        }));
        assertEquals(List.of(), names(dir));
    }

    @Test
    void commonWriteErrorsInPlainWordsWithoutTemporaryNames() {
        String temp = ".a.json.counterpoise-12-3.tmp";
        assertEquals("permission denied", PlainMessages.writeFailure(new AccessDeniedException(temp)));
        assertEquals("its folder does not exist", PlainMessages.writeFailure(new NoSuchFileException(temp)));
        assertEquals("the disk is full", PlainMessages.writeFailure(new IOException("No space left on device")));
        assertEquals("the disk is full",
                PlainMessages.writeFailure(new FileSystemException(temp, null, "No space left on device")));
        assertEquals("the disk is read-only",
                PlainMessages.writeFailure(new FileSystemException(temp, null, "Read-only file system")));
        assertEquals("the disk quota is used up", PlainMessages.writeFailure(new IOException("Disk quota exceeded")));
        assertEquals("the disk or network failed while writing",
                PlainMessages.writeFailure(new IOException(new IOException("Stale file handle"))));
        assertEquals("the disk or network failed while writing", PlainMessages.writeFailure(new IOException()));
        assertEquals("the disk is full", PlainMessages.writeFailure(
                new IOException("Error writing SVG", new IOException("No space left on device"))));
        for (IOException e : List.of(new AccessDeniedException(temp), new FileSystemException(temp, null, "Odd"),
                new IOException(new java.io.UncheckedIOException(new IOException("x"))))) {
            assertPlain(PlainMessages.writeFailure(e));
            assertFalse(PlainMessages.writeFailure(e).contains("counterpoise-"), PlainMessages.writeFailure(e));
        }
    }

    @Test
    void refusesFoldersPipesAndSocketsAndLeavesThemAsTheyWere(@TempDir Path dir) throws Exception {
        Path folder = Files.createDirectory(dir.resolve("a folder"));
        FileWriteException e = assertThrows(FileWriteException.class, () -> AtomicFiles.write(folder, text("x")));
        assertEquals(folder + " is a folder; give a file name", e.getMessage());
        assertTrue(Files.isDirectory(folder));

        Path socket = dir.resolve("s.sock");
        try (ServerSocketChannel server = ServerSocketChannel.open(StandardProtocolFamily.UNIX)) {
            server.bind(UnixDomainSocketAddress.of(socket));
            e = assertThrows(FileWriteException.class, () -> AtomicFiles.write(socket, text("x")));
            assertTrue(e.getMessage().startsWith(socket + " is a device, pipe or socket"), e.getMessage());
            assertTrue(Files.exists(socket) && !Files.isRegularFile(socket));
        }

        Path fifo = dir.resolve("pipe");
        if (mkfifo(fifo)) {
            e = assertThrows(FileWriteException.class, () -> AtomicFiles.write(fifo, text("x")));
            assertTrue(e.getMessage().startsWith(fifo + " is a device, pipe or socket"), e.getMessage());
            assertTrue(Files.exists(fifo) && !Files.isRegularFile(fifo), "the pipe is still a pipe");
        }
        // A device node, checked without writing (the check is all that stands before a rename).
        Path devNull = Path.of("/dev/null");
        if (Files.exists(devNull)) {
            e = assertThrows(FileWriteException.class, () -> AtomicFiles.checkReplaceable(devNull));
            assertTrue(e.getMessage().startsWith("/dev/null is a device, pipe or socket"), e.getMessage());
        }
        List<String> expected = new ArrayList<>(List.of("a folder", "s.sock"));
        if (Files.exists(fifo, LinkOption.NOFOLLOW_LINKS)) {
            expected.add("pipe");
        }
        assertEquals(expected.stream().sorted().toList(), names(dir), "nothing replaced, no temporary files");
    }

    @Test
    void aSymbolicLinkIsFollowedToTheFileItNamesAndStaysALink(@TempDir Path dir) throws IOException {
        Path real = Files.createDirectory(dir.resolve("shared")).resolve("real.json");
        Files.writeString(real, "old");
        Path link = Files.createSymbolicLink(dir.resolve("link.json"), Path.of("shared", "real.json"));
        AtomicFiles.write(link, text("new"));
        assertTrue(Files.isSymbolicLink(link), "the link stays a link");
        assertEquals("new", Files.readString(real));
        assertEquals(List.of("real.json"), names(real.getParent()));

        Path dangling = Files.createSymbolicLink(dir.resolve("dangling.json"), dir.resolve("nowhere.json"));
        FileWriteException e = assertThrows(FileWriteException.class, () -> AtomicFiles.write(dangling, text("x")));
        assertTrue(e.getMessage().startsWith(dangling + " is a symbolic link to "), e.getMessage());
        Path loopA = dir.resolve("a.json");
        Path loopB = dir.resolve("b.json");
        Files.createSymbolicLink(loopA, loopB);
        Files.createSymbolicLink(loopB, loopA);
        e = assertThrows(FileWriteException.class, () -> AtomicFiles.write(loopA, text("x")));
        assertEquals(loopA + " is a symbolic link that loops; give the path of a real file", e.getMessage());
        assertFalse(Files.exists(dir.resolve("nowhere.json")));
    }

    @Test
    void aMissingFolderOrAFileInThePathIsNamedPlainly(@TempDir Path dir) throws IOException {
        Path missing = dir.resolve("no such folder").resolve("a.json");
        FileWriteException e = assertThrows(FileWriteException.class, () -> AtomicFiles.write(missing, text("x")));
        assertEquals(missing + " cannot be written here (its folder does not exist)", e.getMessage());
        Path blocker = Files.writeString(dir.resolve("plain-file"), "x");
        Path below = blocker.resolve("a.json");
        e = assertThrows(FileWriteException.class, () -> AtomicFiles.write(below, text("x")));
        assertEquals(below + " cannot be written here (part of the folder path is a file, not a folder)",
                e.getMessage());
    }

    @Test
    void removesTemporaryFilesOfEndedProcessesOnlyAndNothingElse(@TempDir Path dir) throws Exception {
        Process ended = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-version").redirectErrorStream(true).start();
        ended.getInputStream().readAllBytes();
        ended.waitFor();
        long deadPid = ended.pid();
        long livePid = ProcessHandle.current().pid();
        List<String> kept = List.of(".a.json.part", ".a.json12345.part", "a.json.counterpoise-" + deadPid + "-1.tmp",
                ".a.json.counterpoise-" + livePid + "-999999.tmp", ".a.json.counterpoise-x-1.tmp", "notes.txt");
        for (String name : kept) {
            Files.writeString(dir.resolve(name), "someone else's");
        }
        Path stale = Files.writeString(dir.resolve(".a.json.counterpoise-" + deadPid + "-7.tmp"), "left by a kill");
        Path staleOther = Files.writeString(dir.resolve(".b.pdf.counterpoise-" + deadPid + "-8.tmp"), "left too");
        AtomicFiles.write(dir.resolve("a.json"), text("saved"));
        assertFalse(Files.exists(stale));
        assertFalse(Files.exists(staleOther));
        List<String> expected = new ArrayList<>(kept);
        expected.add("a.json");
        assertEquals(expected.stream().sorted().toList(), names(dir));
    }

    @Test
    void aVeryLongNameStillGetsATemporaryFileBesideIt(@TempDir Path dir) throws IOException {
        String name = "\u00e9".repeat(120) + ".json"; // 245 bytes in UTF-8, close to the 255-byte limit
        Path target = dir.resolve(name);
        AtomicFiles.write(target, text("long"));
        assertEquals("long", Files.readString(target));
        assertTrue(TempFiles.tempName(name).getBytes(StandardCharsets.UTF_8).length <= 255);
    }

    @ParameterizedTest
    @ValueSource(ints = {0, 1, 2, 3, 4})
    void aSetIsWrittenWholeOrNotAtAllWhenTheKthFileFails(int k, @TempDir Path dir) throws IOException {
        List<Path> targets = new ArrayList<>();
        for (int i = 0; i < 5; i++) {
            targets.add(dir.resolve("file" + i + ".txt"));
        }
        Files.writeString(targets.get(1), "old 1");
        Files.writeString(targets.get(3), "old 3");
        List<AtomicFiles.Entry> entries = targets.stream().map(t -> new AtomicFiles.Entry(t, bigBody(20_000))).toList();
        // k-th file: the disk fills while it is written
        FileWriteException e = assertThrows(FileWriteException.class,
                () -> AtomicFiles.writeAll(entries, fullAfter(1000, k)));
        assertEquals(targets.get(k) + " cannot be written here (the disk is full); nothing was changed", e.getMessage());
        assertUnchanged(dir);
        // k-th rename refused, after the files before it were already renamed: they are put back
        e = assertThrows(FileWriteException.class, () -> AtomicFiles.writeAll(entries, new AtomicFiles.Faults() {
            @Override
            public void beforeRename(Path target, int index) throws IOException {
                if (index == k) {
                    throw new AccessDeniedException(".file.counterpoise-1-1.tmp");
                }
            }
        }));
        assertEquals(targets.get(k) + " cannot be written here (permission denied); nothing was changed",
                e.getMessage());
        assertUnchanged(dir);
        AtomicFiles.writeAll(entries);
        assertEquals(List.of("file0.txt", "file1.txt", "file2.txt", "file3.txt", "file4.txt"), names(dir));
        assertEquals(20_000, Files.size(targets.get(3)));
    }

    private static void assertUnchanged(Path dir) throws IOException {
        assertEquals(List.of("file1.txt", "file3.txt"), names(dir), "only the files there before, no temporary files");
        assertEquals("old 1", Files.readString(dir.resolve("file1.txt")));
        assertEquals("old 3", Files.readString(dir.resolve("file3.txt")));
    }

    private static void assertPlain(String message) {
        assertFalse(CLASS_NAME.matcher(message).find(), message);
        assertFalse(message.contains(".tmp") || message.contains(".part"), message);
    }

    /** A disk that fills after {@code bytes} bytes of the file at {@code index} (-1: every file). */
    private static AtomicFiles.Faults fullAfter(int bytes, int index) {
        return new AtomicFiles.Faults() {
            private int file = -1;

            @Override
            public OutputStream disk(Path target, OutputStream disk) {
                file++;
                if (index >= 0 && file != index) {
                    return disk;
                }
                return new FilterOutputStream(disk) {
                    private long written;

                    @Override
                    public void write(int b) throws IOException {
                        write(new byte[] {(byte) b}, 0, 1);
                    }

                    @Override
                    public void write(byte[] b, int off, int len) throws IOException {
                        if (written + len > bytes) {
                            int room = (int) (bytes - written);
                            out.write(b, off, room);
                            written = bytes;
                            throw new IOException("No space left on device");
                        }
                        out.write(b, off, len);
                        written += len;
                    }
                };
            }
        };
    }

    private static AtomicFiles.Body text(String s) {
        return out -> out.write(s.getBytes(StandardCharsets.UTF_8));
    }

    private static AtomicFiles.Body bigBody(int size) {
        return out -> {
            for (int i = 0; i < size; i++) {
                out.write('a' + i % 26);
            }
        };
    }

    private static boolean posix(Path dir) {
        return dir.getFileSystem().supportedFileAttributeViews().contains("posix");
    }

    private static boolean mkfifo(Path p) {
        try {
            return new ProcessBuilder("mkfifo", p.toString()).start().waitFor() == 0
                    && Files.exists(p, LinkOption.NOFOLLOW_LINKS);
        } catch (IOException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }

    private static List<String> names(Path dir) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
