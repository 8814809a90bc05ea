package org.counterpoise.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryIteratorException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.attribute.FileAttribute;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.locks.Lock;
import java.util.concurrent.locks.ReadWriteLock;
import java.util.concurrent.locks.ReentrantReadWriteLock;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The temporary files of {@link AtomicFiles}: their names, the registry of those on the disk
 * right now, and their removal. A temporary file is named {@code .NAME.counterpoise-PID-N.tmp}
 * (hidden, our mark, the writing process's id, a counter), so that a write can remove the ones of
 * processes that no longer run (after SIGKILL or a power cut) and touch no other file; a shutdown
 * hook removes the ones in flight when the program is stopped.
 */
final class TempFiles {
    private static final String MARK = ".counterpoise-";
    /** Our temporary files and no one else's: hidden, our mark, the writer's process id, a counter. */
    private static final Pattern OURS = Pattern.compile("\\..*\\.counterpoise-(\\d{1,18})-\\d{1,19}\\.tmp");
    private static final long PID = ProcessHandle.current().pid();
    private static final AtomicLong COUNTER = new AtomicLong();
    /** Room for the destination's name inside a temporary name; file names are limited to 255 bytes. */
    private static final int NAME_BYTES = 150;
    private static final Set<PosixFilePermission> PRIVATE = PosixFilePermissions.fromString("rw-------");
    /** Temporary files on the disk right now; the shutdown hook deletes them. */
    private static final Set<Path> IN_FLIGHT = ConcurrentHashMap.newKeySet();
    /** Writers hold the read side while creating and registering a temporary file; the hook the write side. */
    private static final ReadWriteLock REGISTRY = new ReentrantReadWriteLock();
    private static volatile boolean stopping;

    static {
        try {
            Runtime.getRuntime().addShutdownHook(new Thread(TempFiles::removeInFlight, "counterpoise-temp-cleanup"));
        } catch (IllegalStateException alreadyShuttingDown) {
            stopping = true;
        }
    }


    interface Create {
        void at(Path temp) throws IOException;
    }

    /**
     * Creates a temporary file beside {@code real} under a fresh name and registers it for the
     * shutdown hook, both under the registry's read lock: the hook then either sees the file or
     * has already stopped new ones.
     */
    static Path registered(Path real, Create create) throws IOException {
        Lock lock = REGISTRY.readLock();
        lock.lock();
        try {
            if (stopping) {
                throw new IOException("stopping");
            }
            while (true) {
                Path temp = real.resolveSibling(tempName(real.getFileName().toString()));
                IN_FLIGHT.add(temp);
                try {
                    create.at(temp);
                    return temp;
                } catch (FileAlreadyExistsException taken) {
                    IN_FLIGHT.remove(temp);
                } catch (IOException | RuntimeException e) {
                    IN_FLIGHT.remove(temp);
                    throw e;
                }
            }
        } finally {
            lock.unlock();
        }
    }

    static String tempName(String name) {
        String shortened = name;
        while (shortened.getBytes(StandardCharsets.UTF_8).length > NAME_BYTES) {
            shortened = shortened.substring(0, shortened.offsetByCodePoints(shortened.length(), -1));
        }
        return "." + shortened + MARK + PID + "-" + COUNTER.incrementAndGet() + ".tmp";
    }

    static FileAttribute<?>[] privateFile() {
        return AtomicFiles.POSIX ? new FileAttribute<?>[] {PosixFilePermissions.asFileAttribute(PRIVATE)} : new FileAttribute<?>[0];
    }

    static void discard(Path temp) {
        if (temp == null) {
            return;
        }
        try {
            Files.deleteIfExists(temp);
        } catch (IOException e) {
            // left for the next write to this folder, which removes it once this process has ended
            return;
        }
        IN_FLIGHT.remove(temp);
    }

    /** Deletes this folder's temporary files of processes that no longer run. */
    static void removeStale(Path folder) {
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(folder,
                p -> OURS.matcher(p.getFileName().toString()).matches())) {
            for (Path p : entries) {
                Matcher m = OURS.matcher(p.getFileName().toString());
                if (!m.matches()) {
                    continue;
                }
                long pid = Long.parseLong(m.group(1));
                boolean running = pid == PID || ProcessHandle.of(pid).map(ProcessHandle::isAlive).orElse(false);
                if (!running && Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)) {
                    Files.deleteIfExists(p);
                }
            }
        } catch (IOException | DirectoryIteratorException | SecurityException e) {
            // Best effort: a folder that cannot be listed or cleaned is reported by the write itself.
        }
    }

    private static void removeInFlight() {
        Lock lock = REGISTRY.writeLock();
        lock.lock();
        try {
            stopping = true;
            for (Path temp : IN_FLIGHT) {
                try {
                    Files.deleteIfExists(temp);
                } catch (IOException e) {
                    // the next write to this folder removes it
                }
            }
        } finally {
            lock.unlock();
        }
    }

    /** @return true once the program is stopping (no new temporary file is made then) */
    static boolean stopping() {
        return stopping;
    }

    private TempFiles() {
    }
}
