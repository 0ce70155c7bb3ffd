package org.shearstack.view;

import java.io.IOException;
import java.nio.file.ClosedWatchServiceException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardWatchEventKinds;
import java.nio.file.WatchEvent;
import java.nio.file.WatchKey;
import java.nio.file.WatchService;
import java.time.Duration;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.function.Consumer;

/**
 * Watches a source's files and reloads it after they change. Editors save in bursts (truncate, write,
 * rename), so changes are gathered until the files have been quiet for the debounce interval; a reload
 * happens only when the content actually differs from the last load. Runs on one daemon thread;
 * the listener is called on that thread.
 */
public final class SceneWatcher implements AutoCloseable {

    /** A debounce that absorbs an editor's save burst yet keeps the update feeling immediate. */
    public static final Duration DEFAULT_DEBOUNCE = Duration.ofMillis(60);

    private final SceneSource source;
    private final Duration debounce;
    private final Consumer<Reload> listener;
    private final WatchService service;
    private final Set<Path> files;
    private final Map<Path, byte[]> lastContent = new HashMap<>();
    private final Thread thread;

    private SceneWatcher(SceneSource source, Duration debounce, Consumer<Reload> listener) throws IOException {
        this.source = source;
        this.debounce = debounce;
        this.listener = listener;
        this.files = new HashSet<>();
        this.service = FileSystems.getDefault().newWatchService();
        Set<Path> folders = new HashSet<>();
        for (Path p : source.watchedFiles()) {
            Path abs = p.toAbsolutePath().normalize();
            files.add(abs);
            lastContent.put(abs, readOrNull(abs));
            folders.add(abs.getParent());
        }
        for (Path folder : folders) {
            folder.register(service, StandardWatchEventKinds.ENTRY_CREATE, StandardWatchEventKinds.ENTRY_MODIFY,
                    StandardWatchEventKinds.ENTRY_DELETE);
        }
        this.thread = new Thread(this::run, "scene-watcher " + source.describe());
        thread.setDaemon(true);
    }

    /**
     * Starts watching; the listener receives one {@link Reload} per effective change. Does not load first:
     * the caller loads once itself and shows that.
     */
    public static SceneWatcher start(SceneSource source, Duration debounce, Consumer<Reload> listener) throws IOException {
        Objects.requireNonNull(listener, "listener");
        if (debounce.isNegative()) {
            throw new IllegalArgumentException("debounce: expected zero or more, found " + debounce);
        }
        SceneWatcher watcher = new SceneWatcher(source, debounce, listener);
        watcher.thread.start();
        return watcher;
    }

    private void run() {
        try {
            while (!Thread.currentThread().isInterrupted()) {
                WatchKey key = service.take();
                boolean relevant = drain(key);
                // gather the rest of the burst
                WatchKey more;
                while ((more = service.poll(debounce.toMillis(), TimeUnit.MILLISECONDS)) != null) {
                    relevant |= drain(more);
                }
                if (relevant && contentChanged()) {
                    listener.accept(Reload.from(source));
                }
            }
        } catch (InterruptedException | ClosedWatchServiceException e) {
            Thread.currentThread().interrupt();
        }
    }

    private boolean drain(WatchKey key) {
        boolean relevant = false;
        Path folder = (Path) key.watchable();
        for (WatchEvent<?> event : key.pollEvents()) {
            if (event.kind() == StandardWatchEventKinds.OVERFLOW) {
                relevant = true;
            } else if (event.context() instanceof Path name && files.contains(folder.resolve(name).normalize())) {
                relevant = true;
            }
        }
        key.reset();
        return relevant;
    }

    private boolean contentChanged() {
        boolean changed = false;
        for (Path p : files) {
            byte[] now = readOrNull(p);
            if (!Arrays.equals(now, lastContent.get(p))) {
                lastContent.put(p, now);
                changed = true;
            }
        }
        return changed;
    }

    private static byte[] readOrNull(Path p) {
        try {
            return Files.readAllBytes(p);
        } catch (IOException e) {
            return null;
        }
    }

    /** The watched files, absolute. */
    public List<Path> files() {
        return List.copyOf(files);
    }

    @Override
    public void close() {
        thread.interrupt();
        try {
            service.close();
        } catch (IOException e) {
            // closing a watch service only releases native handles; nothing to report
        }
    }
}
