package org.ladderkin.archive;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;

/** SHA-256 of a file, computed independently of the code under test. */
final class DigestsForTests {

    private DigestsForTests() {
    }

    static String sha256(Path file) throws Exception {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
    }
}
