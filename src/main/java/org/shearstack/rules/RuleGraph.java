package org.shearstack.rules;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * Orders rules so every rule runs after the rules that write what it reads (Kahn 1962, ties broken by
 * registration order so the order is deterministic), after checking that no key has two writers and that
 * every key name has one dimension.
 */
final class RuleGraph {

    private RuleGraph() {
    }

    static List<Rule> order(List<Rule> rules) {
        Map<String, Rule> writer = writers(rules);
        checkDimensions(rules);
        int n = rules.size();
        List<List<Integer>> dependents = new ArrayList<>();
        int[] indegree = new int[n];
        Map<Rule, Integer> index = new HashMap<>();
        for (int i = 0; i < n; i++) {
            dependents.add(new ArrayList<>());
            index.put(rules.get(i), i);
        }
        for (int i = 0; i < n; i++) {
            for (Key k : new java.util.LinkedHashSet<>(rules.get(i).reads())) {
                Rule w = writer.get(k.name());
                if (w != null) {
                    if (w == rules.get(i)) {
                        throw new RuleGraphException("cycle: rule " + w.id() + " reads " + k + " which it writes itself",
                                List.of(k.name()));
                    }
                    dependents.get(index.get(w)).add(i);
                    indegree[i]++;
                }
            }
        }
        java.util.PriorityQueue<Integer> ready = new java.util.PriorityQueue<>();
        for (int i = 0; i < n; i++) {
            if (indegree[i] == 0) {
                ready.add(i);
            }
        }
        List<Rule> ordered = new ArrayList<>(n);
        while (!ready.isEmpty()) {
            int i = ready.poll();
            ordered.add(rules.get(i));
            for (int d : dependents.get(i)) {
                if (--indegree[d] == 0) {
                    ready.add(d);
                }
            }
        }
        if (ordered.size() < n) {
            throw cycle(rules, writer, indegree);
        }
        return List.copyOf(ordered);
    }

    private static Map<String, Rule> writers(List<Rule> rules) {
        Map<String, Rule> writer = new LinkedHashMap<>();
        Map<String, List<String>> doubles = new LinkedHashMap<>();
        java.util.Set<String> ids = new java.util.HashSet<>();
        for (Rule r : rules) {
            if (!ids.add(r.id())) {
                throw new RuleGraphException("two rules share the id " + r.id(), List.of());
            }
            for (Key k : r.writes()) {
                Rule previous = writer.putIfAbsent(k.name(), r);
                if (previous != null && previous != r) {
                    doubles.computeIfAbsent(k.name(), x -> new ArrayList<>(List.of(previous.id()))).add(r.id());
                }
            }
        }
        if (!doubles.isEmpty()) {
            StringBuilder b = new StringBuilder("keys written by more than one rule:");
            doubles.forEach((k, ids2) -> b.append(' ').append(k).append(" (").append(String.join(", ", ids2)).append(')'));
            throw new RuleGraphException(b.toString(), new ArrayList<>(doubles.keySet()));
        }
        return writer;
    }

    private static void checkDimensions(List<Rule> rules) {
        Map<String, Key> seen = new HashMap<>();
        for (Rule r : rules) {
            List<Key> all = new ArrayList<>(r.reads());
            all.addAll(r.writes());
            for (Key k : all) {
                Key other = seen.putIfAbsent(k.name(), k);
                if (other != null && other.dimension() != k.dimension()) {
                    throw new RuleGraphException("key " + k.name() + " is used as " + other.dimension() + " and as "
                            + k.dimension() + " (rule " + r.id() + ")", List.of(k.name()));
                }
            }
        }
    }

    /** Walks back from a rule left over to find one cycle and name its keys and rules in order. */
    private static RuleGraphException cycle(List<Rule> rules, Map<String, Rule> writer, int[] indegree) {
        Rule start = null;
        for (int i = 0; i < rules.size(); i++) {
            if (indegree[i] > 0) {
                start = rules.get(i);
                break;
            }
        }
        Deque<Rule> path = new ArrayDeque<>();
        Deque<String> viaKeys = new ArrayDeque<>();
        Map<Rule, Integer> position = new HashMap<>();
        Rule current = start;
        while (current != null && !position.containsKey(current)) {
            position.put(current, path.size());
            path.addLast(current);
            Rule next = null;
            for (Key k : current.reads()) {
                Rule w = writer.get(k.name());
                if (w != null && indegree[rules.indexOf(w)] > 0) {
                    next = w;
                    viaKeys.addLast(k.name());
                    break;
                }
            }
            current = next;
        }
        List<Rule> p = new ArrayList<>(path);
        List<String> k = new ArrayList<>(viaKeys);
        int from = current == null ? 0 : position.get(current);
        List<String> cycleKeys = new ArrayList<>(k.subList(from, k.size()));
        StringBuilder b = new StringBuilder("cycle between rules:");
        for (int i = from; i < p.size(); i++) {
            b.append(' ').append(p.get(i).id()).append(" reads ").append(k.get(i)).append(',');
        }
        b.setLength(b.length() - 1);
        b.append(" (keys ").append(String.join(", ", new TreeSet<>(cycleKeys))).append(')');
        return new RuleGraphException(b.toString(), cycleKeys);
    }
}
