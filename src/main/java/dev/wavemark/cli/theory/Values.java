package dev.wavemark.cli.theory;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The named results of one evaluation of a relation, in print order. Each entry has a JSON/CSV key
 * (camelCase, with its unit in the name where it has one, e.g. {@code betaDeg}), a human label and
 * a value (a number, or a short text such as a branch name).
 */
final class Values {
  /** One named result. {@code value} is a {@link Double} or a {@link String}. */
  record Entry(String key, String label, Object value) {}

  private final List<Entry> entries = new ArrayList<>();

  /** Adds a number. */
  Values put(String key, String label, double value) {
    entries.add(new Entry(key, label, value));
    return this;
  }

  /** Adds an angle given in radians; it is shown in degrees under a key ending in {@code Deg}. */
  Values putDeg(String key, String label, double rad) {
    entries.add(new Entry(key, label, Math.toDegrees(rad)));
    return this;
  }

  /** Adds a text value. */
  Values put(String key, String label, String value) {
    entries.add(new Entry(key, label, value));
    return this;
  }

  /** Appends all entries of another block. */
  Values putAll(Values other) {
    entries.addAll(other.entries);
    return this;
  }

  List<Entry> entries() {
    return Collections.unmodifiableList(entries);
  }

  List<String> keys() {
    return entries.stream().map(Entry::key).toList();
  }

  /** The value of {@code key}, for tests and composed relations. */
  Object get(String key) {
    for (Entry e : entries) {
      if (e.key().equals(key)) {
        return e.value();
      }
    }
    throw new IllegalArgumentException("no value named " + key);
  }

  Map<String, Object> asMap() {
    Map<String, Object> m = new LinkedHashMap<>();
    for (Entry e : entries) {
      m.put(e.key(), e.value());
    }
    return m;
  }
}
