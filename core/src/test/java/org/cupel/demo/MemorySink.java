package org.cupel.demo;

import java.io.ByteArrayOutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import java.util.TreeMap;

/** A demo sink that keeps every file in memory, keyed by relative path in sorted order. */
final class MemorySink implements DemoSink {

    private final Map<String, ByteArrayOutputStream> files = new TreeMap<>();

    @Override
    public Writer open(String relativePath) {
        if (files.containsKey(relativePath)) {
            throw new IllegalStateException("written twice: " + relativePath);
        }
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        files.put(relativePath, bytes);
        return new OutputStreamWriter(bytes, StandardCharsets.UTF_8);
    }

    Map<String, byte[]> bytes() {
        Map<String, byte[]> out = new TreeMap<>();
        files.forEach((k, v) -> out.put(k, v.toByteArray()));
        return out;
    }

    byte[] bytes(String path) {
        return files.get(path).toByteArray();
    }

    String text(String path) {
        return new String(bytes(path), StandardCharsets.UTF_8);
    }

    Iterable<String> paths() {
        return files.keySet();
    }
}
