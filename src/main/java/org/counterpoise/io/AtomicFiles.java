package org.counterpoise.io;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * The one way Counterpoise writes a file (projects, sheets, charts, exports), by the usual safe-save
 * pattern: the content goes into a hidden temporary file beside the destination, is flushed to
 * the disk, and is renamed over the destination in one step; then the folder is flushed, so the
 * rename itself survives a power cut. A crash, a kill or a full disk therefore leaves either the
 * complete old file or the complete new one.
 *
 * <p>Nothing is left behind: the temporary file is deleted after any error; a shutdown hook
 * deletes the ones in flight when the program is stopped (SIGTERM, SIGINT, closing the window);
 * and since nothing runs after SIGKILL or a power cut, temporary files are named
 * {@code .NAME.counterpoise-PID-N.tmp} and every write removes those of processes that no longer
 * run from its folder ({@link TempFiles}). No other file is ever touched by that clean-up. (Two
 * machines or containers writing the same file in a shared folder at the same moment could see
 * each other's writer as ended; the one whose temporary file is removed then reports a failed
 * write and changes nothing.)
 *
 * <p>What is replaced: only an ordinary file. A folder, device, pipe or socket is refused, and so
 * is a read-only file. A symbolic link is followed to the file it names, and that file is replaced
 * (the link stays a link, as a user who linked a shared project expects); a link to nothing or a
 * loop of links is refused. A replaced file keeps its permission bits (POSIX systems); a new one
 * gets rw-r--r--. Owner, group, ACLs and extended attributes are not carried over.
 *
 * <p>A set of files ({@link #writeAll}) is written whole or not at all: every file goes to its
 * temporary file first, and only when all are on the disk are they renamed; should a rename fail,
 * the files already replaced are put back from hard-linked (or copied) backups.
 *
 * <p>Every failure is a {@link FileWriteException} naming the destination, in plain words.
 */
public final class AtomicFiles {
    /** Writes the content of a file. */
    @FunctionalInterface
    public interface Body {
        /**
         * @param out the stream to write to (closing it is allowed and has no effect)
         * @throws IOException on a write failure
         */
        void write(OutputStream out) throws IOException;
    }

    /**
     * One file of a set.
     * @param target where it goes
     * @param body what it holds
     */
    public record Entry(Path target, Body body) {
        /** Checks that both are given. */
        public Entry {
            Objects.requireNonNull(target, "target");
            Objects.requireNonNull(body, "body");
        }
    }

    /** Test seams: the stream that reaches the disk, and the step before each rename. */
    interface Faults {
        default OutputStream disk(Path target, OutputStream disk) {
            return disk;
        }

        default void beforeRename(Path target, int index) throws IOException {
        }
    }

    private static final Faults NONE = new Faults() {
    };

    private static final String NOTHING_CHANGED = "nothing was changed";
    /** Same limit as Linux's path resolution (MAXSYMLINKS). */
    private static final int MAX_LINK_HOPS = 40;
    private static final int BUFFER = 1 << 16;
    static final boolean POSIX = FileSystems.getDefault().supportedFileAttributeViews().contains("posix");
    private static final boolean WINDOWS = System.getProperty("os.name", "").startsWith("Windows");
    private static final Set<PosixFilePermission> NEW_FILE = PosixFilePermissions.fromString("rw-r--r--");

    private AtomicFiles() {
    }

    /**
     * Creates or replaces one file.
     * @param target the file to create or replace
     * @param body writes the content
     * @throws FileWriteException when it cannot be written or must not be replaced; the old file
     *     is then unchanged
     * @throws IOException never other than FileWriteException (declared for older callers)
     */
    public static void write(Path target, Body body) throws IOException {
        writeAll(List.of(new Entry(target, body)), NONE);
    }

    /**
     * Creates or replaces a set of files, all or none.
     * @param entries the files
     * @throws FileWriteException when one cannot be written or must not be replaced (it names
     *     that one); no file of the set is then changed
     */
    public static void writeAll(List<Entry> entries) throws FileWriteException {
        writeAll(entries, NONE);
    }

    /**
     * Why a path must not be replaced, checked without writing.
     * @param target a destination
     * @throws FileWriteException when it is a folder, device, pipe, socket, read-only file, a
     *     link to nothing or a loop of links, or its folder does not exist
     */
    public static void checkReplaceable(Path target) throws FileWriteException {
        destination(target);
    }

    static void writeAll(List<Entry> entries, Faults faults) throws FileWriteException {
        List<Slot> slots = new ArrayList<>();
        Set<Path> seen = new HashSet<>();
        Set<Path> folders = new LinkedHashSet<>();
        for (Entry e : entries) {
            Path real = destination(e.target());
            if (!seen.add(real.normalize())) {
                throw new FileWriteException(e.target(), "is named twice among the files to write");
            }
            slots.add(new Slot(e, real));
            folders.add(real.getParent());
        }
        folders.forEach(TempFiles::removeStale);
        Slot current = null;
        try {
            for (Slot s : slots) {
                current = s;
                s.temp = TempFiles.registered(s.real, temp -> Files.createFile(temp, TempFiles.privateFile()));
                writeTemp(s, faults);
            }
            current = null;
            renameAll(slots, faults);
            syncFolders(slots);
        } catch (IOException e) {
            throw failure(current, slots, e, NOTHING_CHANGED);
        } finally {
            for (Slot s : slots) {
                TempFiles.discard(s.temp);
                TempFiles.discard(s.backup);
            }
        }
    }

    /** Flushes each folder once; by now every file is in place, so a failure says so. */
    private static void syncFolders(List<Slot> slots) throws FileWriteException {
        Set<Path> done = new HashSet<>();
        for (Slot s : slots) {
            Path folder = s.real.getParent();
            if (done.add(folder)) {
                try {
                    syncFolder(folder);
                } catch (IOException e) {
                    throw new FileWriteException(s.entry.target(), "was written, but its folder could not be flushed"
                            + " to the disk (" + PlainMessages.writeFailure(e) + "); it may not survive a power cut");
                }
            }
        }
    }

    private static void renameAll(List<Slot> slots, Faults faults) throws FileWriteException {
        boolean set = slots.size() > 1;
        Slot current = null;
        try {
            if (set) {
                for (Slot s : slots) {
                    current = s;
                    if (Files.exists(s.real, LinkOption.NOFOLLOW_LINKS)) {
                        s.backup = backup(s.real);
                    }
                }
            }
            for (int i = 0; i < slots.size(); i++) {
                current = slots.get(i);
                faults.beforeRename(current.entry.target(), i);
                move(current.temp, current.real);
                current.renamed = true;
            }
        } catch (IOException e) {
            boolean restored = true;
            for (Slot s : slots) {
                if (s.renamed) {
                    try {
                        if (s.backup != null) {
                            move(s.backup, s.real);
                        } else {
                            Files.deleteIfExists(s.real);
                        }
                    } catch (IOException restoreFailed) {
                        restored = false;
                    }
                }
            }
            throw failure(current, slots, e, restored ? NOTHING_CHANGED
                    : "some files of the set were already replaced and could not be put back");
        }
    }

    private static void writeTemp(Slot s, Faults faults) throws IOException {
        Set<PosixFilePermission> permissions = null;
        if (POSIX) {
            permissions = Files.exists(s.real, LinkOption.NOFOLLOW_LINKS)
                    ? Files.getPosixFilePermissions(s.real, LinkOption.NOFOLLOW_LINKS) : NEW_FILE;
        }
        try (FileChannel channel = FileChannel.open(s.temp, StandardOpenOption.WRITE)) {
            OutputStream disk = faults.disk(s.entry.target(), Channels.newOutputStream(channel));
            OutputStream out = new BufferedOutputStream(new KeepOpen(disk), BUFFER);
            s.entry.body().write(out);
            out.flush();
            if (permissions != null) {
                Files.setPosixFilePermissions(s.temp, permissions);
            }
            // The content (and its permission bits) must be on the disk before the rename makes
            // it the file: otherwise a power cut can leave the new name pointing at empty blocks.
            channel.force(true);
        }
    }

    /** A hard link to the file about to be replaced, so it can be put back; a copy where links are not possible. */
    private static Path backup(Path real) throws IOException {
        try {
            return TempFiles.registered(real, temp -> Files.createLink(temp, real));
        } catch (UnsupportedOperationException | IOException noLinks) {
            return TempFiles.registered(real, temp -> Files.copy(real, temp, StandardCopyOption.COPY_ATTRIBUTES));
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /**
     * Flushes a folder so that a rename in it survives a power cut (fsync of the directory, as
     * POSIX requires for a durable rename). Windows cannot open a folder as a file channel (and
     * NTFS journals the rename itself), so it is skipped there, as it is for a file system that
     * offers no channels at all; any other failure is reported.
     */
    private static void syncFolder(Path folder) throws IOException {
        if (WINDOWS) {
            return;
        }
        try (FileChannel channel = FileChannel.open(folder, StandardOpenOption.READ)) {
            channel.force(true);
        } catch (UnsupportedOperationException notSupported) {
            // a file system provider without file channels: nothing to flush through
        }
    }

    /**
     * Resolves a destination to the ordinary file that will be replaced, or refuses it.
     * @return the absolute path of the file to create or replace (a link's final target)
     */
    private static Path destination(Path target) throws FileWriteException {
        Path p = target.toAbsolutePath();
        try {
            for (int hops = 0; Files.isSymbolicLink(p); hops++) {
                if (hops == MAX_LINK_HOPS) {
                    throw new FileWriteException(target, "is a symbolic link that loops; give the path of a real file");
                }
                p = p.getParent().resolve(Files.readSymbolicLink(p));
            }
            BasicFileAttributes a;
            try {
                a = Files.readAttributes(p, BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS);
            } catch (NoSuchFileException missing) {
                a = null;
            }
            if (a == null) {
                if (!p.equals(target.toAbsolutePath())) {
                    throw new FileWriteException(target, "is a symbolic link to " + p
                            + ", which does not exist; give the path of a real file");
                }
                Path folder = p.getParent();
                if (folder == null || !Files.isDirectory(folder)) {
                    throw new FileWriteException(target, "cannot be written here ("
                            + (folder != null && Files.exists(folder) ? "part of the folder path is a file, not a folder"
                            : "its folder does not exist") + ")");
                }
                return p;
            }
            if (a.isDirectory()) {
                throw new FileWriteException(target, "is a folder; give a file name");
            }
            if (!a.isRegularFile()) {
                throw new FileWriteException(target, "is a device, pipe or socket, not an ordinary file;"
                        + " only ordinary files are replaced");
            }
            if (Files.getFileStore(p).isReadOnly()) {
                throw new FileWriteException(target, "is on a read-only disk; choose another folder");
            }
            if (!Files.isWritable(p)) {
                throw new FileWriteException(target, "is read-only; make it writable or choose another name");
            }
            return p;
        } catch (FileWriteException e) {
            throw e;
        } catch (IOException e) {
            throw new FileWriteException(target, "cannot be written here (" + PlainMessages.writeFailure(e) + ")");
        }
    }

    private static FileWriteException failure(Slot current, List<Slot> slots, IOException e, String outcome) {
        if (e instanceof FileWriteException f) {
            return f;
        }
        Path named = current != null ? current.entry.target() : slots.get(0).entry.target();
        String reason = TempFiles.stopping() ? "Counterpoise was stopped while writing" : PlainMessages.writeFailure(e);
        return new FileWriteException(named, "cannot be written here (" + reason + "); " + outcome);
    }

    /** One destination in a write: the entry, its resolved file, its temporary file and backup. */
    private static final class Slot {
        final Entry entry;
        final Path real;
        Path temp;
        Path backup;
        boolean renamed;

        Slot(Entry entry, Path real) {
            this.entry = entry;
            this.real = real;
        }
    }

    /** Lets a body close "its" stream without closing the file before it is flushed to the disk. */
    private static final class KeepOpen extends OutputStream {
        private final OutputStream out;

        KeepOpen(OutputStream out) {
            this.out = out;
        }

        @Override
        public void write(int b) throws IOException {
            out.write(b);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
        }

        @Override
        public void flush() throws IOException {
            out.flush();
        }

        @Override
        public void close() throws IOException {
            out.flush();
        }
    }
}
