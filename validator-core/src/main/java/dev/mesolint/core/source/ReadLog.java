package dev.mesolint.core.source;

import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.ConcurrentHashMap;

/**
 * While open, records every file mesolint reads (programmes, configuration, profiles, catalogues, baselines) with a
 * SHA-256 of the bytes it read, so that a caller can later prove a whole run's inputs unchanged without repeating the
 * run. Several logs may be open at once (modules of a parallel Maven build share a JVM): each sees every read, a
 * superset of its own, which can only make a proof stricter, never looser.
 */
public final class ReadLog implements AutoCloseable {
    private static final Set<ReadLog> OPEN = ConcurrentHashMap.newKeySet();

    private final Map<Path, String> read = new ConcurrentHashMap<>();

    private ReadLog() {
    }

    /** Starts recording; close it when the run is over. */
    public static ReadLog open() {
        ReadLog log = new ReadLog();
        OPEN.add(log);
        return log;
    }

    /** Called by every reader with the bytes it read; costs nothing while no log is open. */
    public static void record(Path file, byte[] bytes) {
        if (OPEN.isEmpty()) {
            return;
        }
        String hash = sha256(bytes);
        Path key = file.toAbsolutePath().normalize();
        for (ReadLog log : OPEN) {
            log.read.put(key, hash);
        }
    }

    /** The files read so far, by absolute path, each with the hash of the bytes read. */
    public Map<Path, String> files() {
        return new TreeMap<>(read);
    }

    @Override
    public void close() {
        OPEN.remove(this);
    }

    /** SHA-256 as lower-case hex (the same digest the result cache uses). */
    public static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }
}
