package org.statesum.api.config;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Arrays;
import java.util.Collection;
import java.util.List;
import java.util.regex.Pattern;

/**
 * The bearer tokens that grant access, kept only as SHA-256 digests so that neither a log line nor a
 * {@code toString} can leak one. A presented token is compared with every digest in constant time
 * ({@link MessageDigest#isEqual}), so the answer time does not reveal how much of a token matched.
 */
public final class BearerTokens {

    /** RFC 6750 token68 characters, 16 to 512 of them: short tokens are guessable. */
    private static final Pattern TOKEN = Pattern.compile("[A-Za-z0-9\\-._~+/]{16,512}=*");

    private final List<byte[]> digests;

    private BearerTokens(List<byte[]> digests) {
        this.digests = digests;
    }

    /** No tokens: authentication is off. */
    public static BearerTokens none() {
        return new BearerTokens(List.of());
    }

    /** These tokens, each well-formed (see {@link #wellFormed}). */
    public static BearerTokens of(Collection<String> tokens) {
        return new BearerTokens(tokens.stream().map(BearerTokens::digest).toList());
    }

    static boolean wellFormed(String token) {
        return TOKEN.matcher(token).matches();
    }

    /** Whether authentication is on. */
    public boolean enabled() {
        return !digests.isEmpty();
    }

    /** Whether the token is one of the configured ones. */
    public boolean accepts(String token) {
        byte[] presented = digest(token);
        boolean match = false;
        for (byte[] known : digests) {
            match |= MessageDigest.isEqual(known, presented);
        }
        return match;
    }

    private static byte[] digest(String token) {
        try {
            return MessageDigest.getInstance("SHA-256").digest(token.getBytes(StandardCharsets.UTF_8));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java runtime", e);
        }
    }

    /** Equal when both hold the same tokens in the same order (settings compare by value). */
    @Override
    public boolean equals(Object other) {
        if (!(other instanceof BearerTokens that) || that.digests.size() != digests.size()) {
            return false;
        }
        for (int i = 0; i < digests.size(); i++) {
            if (!Arrays.equals(digests.get(i), that.digests.get(i))) {
                return false;
            }
        }
        return true;
    }

    @Override
    public int hashCode() {
        int hash = 1;
        for (byte[] digest : digests) {
            hash = 31 * hash + Arrays.hashCode(digest);
        }
        return hash;
    }

    @Override
    public String toString() {
        return digests.size() + " bearer token(s)";
    }
}
