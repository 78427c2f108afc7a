package org.clearance.rules;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.clearance.InputException;
import org.clearance.io.TextFiles;
import org.clearance.io.YamlMap;
import org.yaml.snakeyaml.nodes.Node;

/**
 * Reads rule profiles (YAML, format in docs/rules.md), follows {@code extends} to the profiles
 * they build on, merges the chain and validates the result. Every error is an
 * {@link InputException} naming the file, line and key.
 */
public final class RuleProfileReader {

  /** Classpath folder of the built-in profiles. */
  static final String BUILTIN_FOLDER = "/span-specs/rules/";

  /** Longest inheritance chain accepted; a guard, real chains are two or three deep. */
  private static final int MAX_CHAIN = 16;

  /** Keys allowed at the top level of a profile file. */
  static final Set<String> TOP_KEYS = Set.of("name", "title", "source", "cautions", "extends",
      "zones", "growth_m_per_year", "trim_cycle_years", "fall_in", "applies_from_kv",
      "covered_lines", "confidence_percent");

  private RuleProfileReader() {}

  /**
   * Reads a profile file. A relative {@code extends} path is taken from the file's folder.
   *
   * @param file the profile file (UTF-8 YAML)
   * @throws InputException when the file, or a profile it extends, cannot be read or is invalid
   */
  public static RuleProfile read(Path file) {
    return resolve(fromFile(file.toAbsolutePath().normalize(), file.toString()));
  }

  /**
   * Reads a profile from text (for example a profile written inline in another file). A relative
   * {@code extends} path is taken from the working directory.
   *
   * @param text the profile YAML
   * @param label name of the text's origin, used in error messages
   */
  public static RuleProfile parse(String text, String label) {
    return resolve(layer(text, label, "text:" + label, null, false));
  }

  /** Reads a built-in profile from the classpath. */
  static RuleProfile readBuiltin(String name) {
    return resolve(fromBuiltin(name, null));
  }

  /** One file of the chain. */
  record Layer(String label, String identity, String text, YamlMap top, Path folder,
      boolean builtin) {}

  private static RuleProfile resolve(Layer first) {
    List<Layer> chain = new ArrayList<>();
    chain.add(first);
    while (true) {
      Layer current = chain.get(chain.size() - 1);
      if (!current.top().has("extends")) {
        break;
      }
      YamlMap.Entry ext = current.top().required("extends");
      Layer parent = parentOf(current, ext);
      List<String> seen = new ArrayList<>();
      for (Layer l : chain) {
        seen.add(l.identity());
      }
      if (seen.contains(parent.identity())) {
        seen.add(parent.identity());
        throw ext.error("profiles extend each other in a cycle: " + String.join(" -> ", seen));
      }
      if (chain.size() >= MAX_CHAIN) {
        throw ext.error("more than " + MAX_CHAIN + " profiles extend each other");
      }
      chain.add(parent);
    }
    ProfileBuilder.Merged merged = ProfileBuilder.merge(chain);
    return ProfileBuilder.build(chain, merged, hash(chain));
  }

  private static Layer parentOf(Layer child, YamlMap.Entry ext) {
    String target = ext.text();
    if (RuleProfiles.names().contains(target)) {
      return fromBuiltin(target, ext);
    }
    if (child.builtin()) {
      throw ext.error("unknown built-in profile '" + target + "'; built-in profiles: "
          + String.join(", ", RuleProfiles.names()));
    }
    Path folder = child.folder() == null ? Path.of("") : child.folder();
    Path path = folder.resolve(target).toAbsolutePath().normalize();
    if (!Files.isRegularFile(path)) {
      throw ext.error("unknown profile '" + target + "': not a built-in profile ("
          + String.join(", ", RuleProfiles.names()) + ") and no such file " + path);
    }
    return fromFile(path, path.toString());
  }

  private static Layer fromFile(Path path, String label) {
    String text = TextFiles.read(path, TextFiles.MAX_YAML_BYTES);
    return layer(text, label, "file:" + path, path.getParent(), false);
  }

  private static Layer fromBuiltin(String name, YamlMap.Entry requestedBy) {
    String resource = BUILTIN_FOLDER + name + ".yaml";
    try (InputStream in = RuleProfileReader.class.getResourceAsStream(resource)) {
      if (in == null) {
        String problem = "no built-in profile '" + name + "'";
        throw requestedBy == null ? new InputException("builtin:" + name, null, null, problem)
            : requestedBy.error(problem);
      }
      String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
      Layer layer = layer(text, "builtin:" + name, "builtin:" + name, null, true);
      String declared = layer.top().required("name").text();
      if (!declared.equals(name)) {
        throw layer.top().required("name").error("a built-in profile's name must match its file");
      }
      return layer;
    } catch (IOException e) {
      throw new InputException("builtin:" + name, null, null, "cannot read: " + e);
    }
  }

  /** Parses one file's text into its top-level mapping and checks its top-level keys. */
  static Layer layer(String text, String label, String identity, Path folder, boolean builtin) {
    Node root = YamlMap.compose(text, label);
    YamlMap top = YamlMap.of(root, label, null);
    top.checkKeys(TOP_KEYS);
    return new Layer(label, identity, text, top, folder, builtin);
  }

  /** SHA-256 over the name and text of every file of the chain, this profile first. */
  private static String hash(List<Layer> chain) {
    try {
      MessageDigest digest = MessageDigest.getInstance("SHA-256");
      for (Layer l : chain) {
        String name = l.top().required("name").text();
        digest.update((name + "\n").getBytes(StandardCharsets.UTF_8));
        digest.update(l.text().getBytes(StandardCharsets.UTF_8));
        digest.update((byte) 0);
      }
      return HexFormat.of().formatHex(digest.digest());
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("SHA-256 is required of every Java runtime", e);
    }
  }

  /** Zones of one layer by name, in file order; a name used twice is an error. */
  static Map<String, YamlMap> zonesOf(Layer layer) {
    Map<String, YamlMap> zones = new LinkedHashMap<>();
    if (!layer.top().has("zones")) {
      return zones;
    }
    YamlMap.Entry entry = layer.top().required("zones");
    if (entry.isNull()) {
      return zones;
    }
    for (Node item : entry.items()) {
      YamlMap zone = YamlMap.of(item, layer.label(), "zones");
      YamlMap.Entry name = zone.required("name");
      if (zones.put(name.text(), zone) != null) {
        throw name.error("zone name '" + name.text() + "' is used twice in this file");
      }
    }
    return zones;
  }
}
