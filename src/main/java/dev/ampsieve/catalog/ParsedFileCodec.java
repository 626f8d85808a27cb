package dev.ampsieve.catalog;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.lang.reflect.Constructor;
import java.lang.reflect.Method;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.security.CodeSource;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

/**
 * A {@link ParsedFile} as bytes, and back, for the parsed-catalog cache. Like the index
 * fingerprint's tagged bytes ({@code search.CatalogFingerprint}), components are found by
 * reflection, so a new field of {@link Part} is covered without touching this; unlike it, the
 * encoding is driven by each component's declared type, so it can be read back: numbers by their
 * exact bits (a cached part equals a parsed one, NaN and -0 included), text as its UTF-16 units
 * (lone surrogates survive), nullable values with a presence byte, enums by ordinal, lists with
 * their length.
 *
 * <p>Paths: every place in a file's problems and parts names that file; it is written as a mark
 * and read back as the file named now, so a catalog given as {@code ./cat} or {@code /abs/cat}, or
 * a copied file, still gets its own name in every message.
 *
 * <p>{@link #IDENTITY} changes with the encoding's shape (every record class, component and enum
 * constant it covers) and with the program itself (the jar, or the class files when run from a
 * build folder): an entry written by another version of the loader, whose checks may differ, is
 * never read.
 */
final class ParsedFileCodec {
    private ParsedFileCodec() {}

    /** Bump when the byte layout changes in a way the shape does not show. */
    static final int FORMAT = 1;

    private static final Map<Class<?>, RecordCodec> RECORDS = new HashMap<>();
    private static final Codec ROOT;
    /** The shape of the encoding, as text (every record, component, type and enum constant). */
    static final String SHAPE;
    /** SHA-256 over {@link #FORMAT}, {@link #SHAPE} and the program's code (see the class comment). */
    static final byte[] IDENTITY;

    static {
        StringBuilder shape = new StringBuilder();
        synchronized (RECORDS) {
            ROOT = codecFor(ParsedFile.class, shape);
        }
        SHAPE = shape.toString();
        MessageDigest md = sha256();
        md.update(("ampsieve parsed-file format " + FORMAT + "\n").getBytes(StandardCharsets.UTF_8));
        md.update(SHAPE.getBytes(StandardCharsets.UTF_8));
        md.update(programStamp().getBytes(StandardCharsets.UTF_8));
        IDENTITY = md.digest();
    }

    /** The bytes of {@code parsed}, read from {@code file}. */
    static byte[] encode(ParsedFile parsed, Path file) {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream(4096);
        try (DataOutputStream out = new DataOutputStream(bytes)) {
            ROOT.write(out, parsed, file);
        } catch (IOException e) {
            throw new UncheckedIOException(e); // writes to memory only
        }
        return bytes.toByteArray();
    }

    /**
     * The file read back, with every place naming {@code file}.
     *
     * @throws IOException when the bytes are not a whole encoding (too short, trailing bytes, a
     *                     length or ordinal out of range, a value a record refuses)
     */
    static ParsedFile decode(byte[] bytes, Path file) throws IOException {
        DataInputStream in = new DataInputStream(new ByteArrayInputStream(bytes));
        Object v;
        try {
            v = ROOT.read(in, file);
        } catch (RuntimeException e) {
            throw new IOException("not a parsed file: " + e, e);
        }
        if (in.available() != 0) {
            throw new IOException("trailing bytes after a parsed file");
        }
        return (ParsedFile) v;
    }

    /** Writes and reads one value of a declared type. */
    private interface Codec {
        void write(DataOutputStream out, Object v, Path file) throws IOException;

        Object read(DataInputStream in, Path file) throws IOException;
    }

    private static Codec codecFor(Type type, StringBuilder shape) {
        Class<?> raw = type instanceof ParameterizedType p ? (Class<?>) p.getRawType() : (Class<?>) type;
        if (raw == int.class) {
            shape.append("int");
            return new Codec() {
                @Override
                public void write(DataOutputStream out, Object v, Path file) throws IOException {
                    out.writeInt((Integer) v);
                }

                @Override
                public Object read(DataInputStream in, Path file) throws IOException {
                    return in.readInt();
                }
            };
        }
        if (raw == long.class) {
            shape.append("long");
            return new Codec() {
                @Override
                public void write(DataOutputStream out, Object v, Path file) throws IOException {
                    out.writeLong((Long) v);
                }

                @Override
                public Object read(DataInputStream in, Path file) throws IOException {
                    return in.readLong();
                }
            };
        }
        if (raw == double.class) {
            shape.append("double");
            return new Codec() {
                @Override
                public void write(DataOutputStream out, Object v, Path file) throws IOException {
                    out.writeLong(Double.doubleToRawLongBits((Double) v));
                }

                @Override
                public Object read(DataInputStream in, Path file) throws IOException {
                    return Double.longBitsToDouble(in.readLong());
                }
            };
        }
        if (raw == boolean.class) {
            shape.append("boolean");
            return new Codec() {
                @Override
                public void write(DataOutputStream out, Object v, Path file) throws IOException {
                    out.writeBoolean((Boolean) v);
                }

                @Override
                public Object read(DataInputStream in, Path file) throws IOException {
                    return in.readBoolean();
                }
            };
        }
        Codec value = referenceCodec(type, raw, shape);
        return new Codec() { // every reference may be null: a presence byte first
            @Override
            public void write(DataOutputStream out, Object v, Path file) throws IOException {
                if (v == null) {
                    out.writeByte(0);
                } else {
                    out.writeByte(1);
                    value.write(out, v, file);
                }
            }

            @Override
            public Object read(DataInputStream in, Path file) throws IOException {
                int present = in.readUnsignedByte();
                if (present > 1) {
                    throw new IOException("bad presence byte " + present);
                }
                return present == 0 ? null : value.read(in, file);
            }
        };
    }

    private static Codec referenceCodec(Type type, Class<?> raw, StringBuilder shape) {
        if (raw == Double.class) {
            shape.append("Double");
            return codecFor(double.class, new StringBuilder());
        }
        if (raw == Integer.class) {
            shape.append("Integer");
            return codecFor(int.class, new StringBuilder());
        }
        if (raw == Long.class) {
            shape.append("Long");
            return codecFor(long.class, new StringBuilder());
        }
        if (raw == Boolean.class) {
            shape.append("Boolean");
            return codecFor(boolean.class, new StringBuilder());
        }
        if (raw == String.class) {
            shape.append("String");
            return new Codec() {
                @Override
                public void write(DataOutputStream out, Object v, Path file) throws IOException {
                    writeString(out, (String) v);
                }

                @Override
                public Object read(DataInputStream in, Path file) throws IOException {
                    return readString(in);
                }
            };
        }
        if (raw == Path.class) {
            shape.append("Path");
            return new Codec() {
                @Override
                public void write(DataOutputStream out, Object v, Path file) throws IOException {
                    if (v.equals(file)) {
                        out.writeByte(0); // the file itself: named afresh on reading
                    } else {
                        out.writeByte(1);
                        writeString(out, v.toString());
                    }
                }

                @Override
                public Object read(DataInputStream in, Path file) throws IOException {
                    int kind = in.readUnsignedByte();
                    return switch (kind) {
                        case 0 -> file;
                        case 1 -> Path.of(readString(in));
                        default -> throw new IOException("bad path kind " + kind);
                    };
                }
            };
        }
        if (raw == double[].class) {
            shape.append("double[]");
            return new Codec() {
                @Override
                public void write(DataOutputStream out, Object v, Path file) throws IOException {
                    double[] a = (double[]) v;
                    out.writeInt(a.length);
                    for (double x : a) {
                        out.writeDouble(x);
                    }
                }

                @Override
                public Object read(DataInputStream in, Path file) throws IOException {
                    int n = in.readInt();
                    if (n < 0 || n > in.available() / 8) {
                        throw new IOException("bad array length " + n);
                    }
                    double[] a = new double[n];
                    for (int i = 0; i < n; i++) {
                        a[i] = in.readDouble();
                    }
                    return a;
                }
            };
        }
        if (raw.isInterface() && raw != List.class) {
            // a problem's fact: in a catalog file always a CatalogFact (its records, by their place in the
            // sealed list); any other interface is a sealed one whose permitted classes are records
            List<Class<?>> kinds = new java.util.ArrayList<>();
            permittedRecords(raw == dev.ampsieve.yaml.ProblemFact.class ? CatalogFact.class : raw, kinds);
            if (kinds.isEmpty()) {
                throw new IllegalStateException("no cache encoding for " + type.getTypeName()
                        + ": add one to ParsedFileCodec (a new kind of catalog value)");
            }
            shape.append("one of ").append(raw.getName()).append('[');
            Codec[] codecs = new Codec[kinds.size()];
            for (int i = 0; i < codecs.length; i++) {
                codecs[i] = referenceCodec(kinds.get(i), kinds.get(i), shape);
                shape.append(';');
            }
            shape.append(']');
            return new Codec() {
                @Override
                public void write(DataOutputStream out, Object v, Path file) throws IOException {
                    int i = kinds.indexOf(v.getClass());
                    if (i < 0) {
                        throw new IOException(
                                "no cache encoding for a " + v.getClass().getName());
                    }
                    out.writeShort(i);
                    codecs[i].write(out, v, file);
                }

                @Override
                public Object read(DataInputStream in, Path file) throws IOException {
                    int i = in.readUnsignedShort();
                    if (i >= codecs.length) {
                        throw new IOException("bad kind " + i + " of " + raw.getSimpleName());
                    }
                    return codecs[i].read(in, file);
                }
            };
        }
        if (raw.isEnum()) {
            Object[] constants = raw.getEnumConstants();
            shape.append("enum ").append(raw.getName()).append(Arrays.toString(constants));
            return new Codec() {
                @Override
                public void write(DataOutputStream out, Object v, Path file) throws IOException {
                    out.writeShort(((Enum<?>) v).ordinal());
                }

                @Override
                public Object read(DataInputStream in, Path file) throws IOException {
                    int i = in.readUnsignedShort();
                    if (i >= constants.length) {
                        throw new IOException("bad ordinal " + i + " of " + raw.getSimpleName());
                    }
                    return constants[i];
                }
            };
        }
        if (raw == List.class && type instanceof ParameterizedType p) {
            shape.append("List<");
            Codec element = codecFor(p.getActualTypeArguments()[0], shape);
            shape.append('>');
            return new Codec() {
                @Override
                public void write(DataOutputStream out, Object v, Path file) throws IOException {
                    List<?> l = (List<?>) v;
                    out.writeInt(l.size());
                    for (Object o : l) {
                        element.write(out, o, file);
                    }
                }

                @Override
                public Object read(DataInputStream in, Path file) throws IOException {
                    int n = in.readInt();
                    if (n < 0 || n > in.available()) { // each element takes at least a byte
                        throw new IOException("bad list length " + n);
                    }
                    Object[] items = new Object[n];
                    for (int i = 0; i < n; i++) {
                        items[i] = element.read(in, file);
                    }
                    return Arrays.asList(items); // the records copy it (List.copyOf)
                }
            };
        }
        if (raw.isRecord()) {
            RecordCodec known = RECORDS.get(raw);
            if (known != null) {
                shape.append("record ").append(raw.getName());
                return known;
            }
            RecordCodec rc = new RecordCodec(raw);
            RECORDS.put(raw, rc);
            shape.append("record ").append(raw.getName()).append('(');
            rc.init(shape);
            shape.append(')');
            return rc;
        }
        throw new IllegalStateException("no cache encoding for " + type.getTypeName()
                + ": add one to ParsedFileCodec (a new kind of catalog value)");
    }

    /** The record classes a sealed interface permits, depth first in declaration order. */
    private static void permittedRecords(Class<?> c, List<Class<?>> out) {
        if (c.isRecord()) {
            out.add(c);
        } else if (c.isSealed()) {
            for (Class<?> k : c.getPermittedSubclasses()) {
                permittedRecords(k, out);
            }
        }
    }

    /** A record: its components in order, built by the canonical constructor. */
    private static final class RecordCodec implements Codec {
        private final Class<?> type;
        private Method[] accessors;
        private Codec[] components;
        private Constructor<?> constructor;

        RecordCodec(Class<?> type) {
            this.type = type;
        }

        void init(StringBuilder shape) {
            RecordComponent[] rc = type.getRecordComponents();
            Class<?>[] types = new Class<?>[rc.length];
            Method[] acc = new Method[rc.length];
            Codec[] codecs = new Codec[rc.length];
            for (int i = 0; i < rc.length; i++) {
                types[i] = rc[i].getType();
                acc[i] = rc[i].getAccessor();
                acc[i].setAccessible(true);
                shape.append(i == 0 ? "" : ",").append(rc[i].getName()).append(':');
                codecs[i] = codecFor(rc[i].getGenericType(), shape);
            }
            try {
                constructor = type.getDeclaredConstructor(types);
                constructor.setAccessible(true);
            } catch (NoSuchMethodException e) {
                throw new IllegalStateException("a record has its canonical constructor", e);
            }
            accessors = acc;
            components = codecs;
        }

        @Override
        public void write(DataOutputStream out, Object v, Path file) throws IOException {
            for (int i = 0; i < accessors.length; i++) {
                Object c;
                try {
                    c = accessors[i].invoke(v);
                } catch (ReflectiveOperationException e) {
                    throw new IllegalStateException("cannot read a component of " + type.getName(), e);
                }
                components[i].write(out, c, file);
            }
        }

        @Override
        public Object read(DataInputStream in, Path file) throws IOException {
            Object[] args = new Object[components.length];
            for (int i = 0; i < args.length; i++) {
                args[i] = components[i].read(in, file);
            }
            try {
                return constructor.newInstance(args);
            } catch (ReflectiveOperationException e) {
                throw new IOException("the values do not make a " + type.getSimpleName() + ": " + e.getCause(), e);
            }
        }
    }

    /** Length, then ASCII as bytes or else UTF-16 units (which keep lone surrogates). */
    private static void writeString(DataOutputStream out, String s) throws IOException {
        int n = s.length();
        boolean ascii = true;
        for (int i = 0; i < n && ascii; i++) {
            ascii = s.charAt(i) < 0x80;
        }
        out.writeInt(ascii ? n : -n - 1);
        if (ascii) {
            out.writeBytes(s);
        } else {
            out.writeChars(s);
        }
    }

    private static String readString(DataInputStream in) throws IOException {
        int n = in.readInt();
        boolean ascii = n >= 0;
        int length = ascii ? n : -(n + 1);
        if (length > in.available() / (ascii ? 1 : 2)) {
            throw new IOException("bad text length " + n);
        }
        if (ascii) {
            byte[] b = new byte[length];
            in.readFully(b);
            for (byte x : b) {
                if (x < 0) {
                    throw new IOException("not ASCII");
                }
            }
            return new String(b, StandardCharsets.ISO_8859_1);
        }
        char[] c = new char[length];
        for (int i = 0; i < length; i++) {
            c[i] = in.readChar();
        }
        return new String(c);
    }

    /**
     * What the program is, cheaply: the jar's path, size and time, or, run from a build folder,
     * every class file's name, size and time below it. A rebuilt program therefore never reads
     * entries an older one wrote (a rebuild with nothing changed only costs one fresh parse).
     */
    private static String programStamp() {
        CodeSource cs = ParsedFileCodec.class.getProtectionDomain().getCodeSource();
        if (cs == null || cs.getLocation() == null) {
            return "unknown program " + System.nanoTime(); // never matches: no caching
        }
        try {
            Path where = Path.of(cs.getLocation().toURI());
            BasicFileAttributes a = Files.readAttributes(where, BasicFileAttributes.class);
            if (!a.isDirectory()) {
                return where + " " + a.size() + " " + a.lastModifiedTime().toMillis();
            }
            StringBuilder sb = new StringBuilder(where.toString());
            List<String> lines = new ArrayList<>();
            try (Stream<Path> s = Files.walk(where)) {
                for (Path p : (Iterable<Path>) s::iterator) {
                    BasicFileAttributes f =
                            Files.readAttributes(p, BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS);
                    if (f.isRegularFile()) {
                        lines.add(where.relativize(p) + " " + f.size() + " "
                                + f.lastModifiedTime().toMillis());
                    }
                }
            }
            lines.sort(null);
            lines.forEach(l -> sb.append('\n').append(l));
            return sb.toString();
        } catch (IOException | URISyntaxException | RuntimeException e) {
            return "unknown program " + System.nanoTime();
        }
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }
}
