package org.variset.archive.search;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;
import org.apache.lucene.document.Document;
import org.apache.lucene.facet.FacetsConfig;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.SegmentInfos;
import org.apache.lucene.index.Term;
import org.apache.lucene.store.ByteBuffersDirectory;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.variset.archive.bulk.OverlappedChunks;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.problem.ArchiveException;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.read.RouteFilter;
import org.variset.archive.read.RouteReader;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.schema.SchemaVersion;
import org.variset.archive.settings.SettingsReader;
import org.variset.archive.settings.SettingsTimeline;
import org.variset.archive.store.Archive;

/**
 * The Lucene index of an archive's routes, in the folder {@code index} of the archive. It is derived data: each
 * commit carries the database's change stamp ({@link ChangeLog}) it reflects, and {@link #sync} applies the changes
 * it has not seen, or rebuilds it when it is missing, damaged, of another format or ahead of the database (an
 * archive restored from a backup). Writes are committed whole or not at all (Lucene's two-phase commit), so a kill
 * leaves the last commit, which the next sync brings up to date.
 */
public final class SearchIndex implements AutoCloseable {
    /** The document layout; a change of layout rebuilds every index made with another. */
    static final String FORMAT = "4";

    private static final String FORMAT_KEY = "variset-index-format";
    private static final String STAMP_KEY = "variset-change-stamp";
    /** The archive the index was built from ({@link SchemaVersion#identity}). */
    private static final String ARCHIVE_KEY = "variset-archive";

    private static final int CHUNK = 1_000;

    /**
     * Commits made by this process, per index folder. Only one process at a time uses an archive (its lock), so an
     * index changes only through commits counted here, and a reader need not ask the disk before every search.
     */
    private static final Map<Path, AtomicLong> COMMITS = new ConcurrentHashMap<>();

    private final Directory directory;
    private final AtomicLong commits;
    private final FacetsConfig facets = RouteDocuments.facetsConfig();
    /** The reader searches use, opened on first use and refreshed when a commit changed the index. */
    private DirectoryReader reader;
    /** The commit count the reader was opened (or last refreshed) at. */
    private long readerAt;

    private SearchIndex(Directory directory, AtomicLong commits) {
        this.directory = directory;
        this.commits = commits;
    }

    /** The index of the archive in a folder (its {@code index} subfolder, created when first written). */
    public static SearchIndex at(Path archiveDir) {
        return at(archiveDir, "index");
    }

    private static SearchIndex at(Path archiveDir, String name) {
        try {
            Path p = archiveDir.resolve(name);
            Files.createDirectories(p);
            return new SearchIndex(
                    FSDirectory.open(p),
                    COMMITS.computeIfAbsent(p.toAbsolutePath().normalize(), k -> new AtomicLong()));
        } catch (IOException e) {
            throw new ArchiveException(
                    ArchiveException.Problem.DAMAGED,
                    "Cannot open the search index in " + archiveDir + ": " + e.getMessage(),
                    e);
        }
    }

    /**
     * The index of an open archive: in its folder for an embedded archive, in this client's cache folder for a
     * shared one, in memory for an archive in memory.
     */
    public static SearchIndex of(Archive archive) {
        Path dir = archive.indexDir();
        return dir == null ? inMemory() : at(dir.getParent(), dir.getFileName().toString());
    }

    /** An index in memory (for an archive in memory). */
    public static SearchIndex inMemory() {
        return new SearchIndex(new ByteBuffersDirectory(), new AtomicLong());
    }

    /** The change stamp the index reflects, or -1 when it is missing, unreadable or of another format. */
    public long stamp() {
        Map<String, String> data = commitData();
        return data.isEmpty() ? -1 : Long.parseLong(data.get(STAMP_KEY));
    }

    /** The last commit's data, or empty when the index is missing, unreadable or of another format. */
    private Map<String, String> commitData() {
        try {
            if (!DirectoryReader.indexExists(directory)) {
                return Map.of();
            }
            Map<String, String> data = SegmentInfos.readLatestCommit(directory).getUserData();
            if (!FORMAT.equals(data.get(FORMAT_KEY)) || data.get(STAMP_KEY) == null) {
                return Map.of();
            }
            Long.parseLong(data.get(STAMP_KEY));
            return data;
        } catch (IOException | RuntimeException e) {
            return Map.of();
        }
    }

    /** Brings the index up to date with the database: nothing, the changes it has not seen, or a rebuild. */
    public IndexSync sync(Connection c, IndexProgress progress) {
        long db = ChangeLog.stamp(c);
        boolean shared = ChangeLog.isShared(c);
        Map<String, String> data = commitData();
        long idx = data.isEmpty() ? -1 : Long.parseLong(data.get(STAMP_KEY));
        if (idx < 0) {
            return rebuild(
                    c,
                    progress,
                    exists() ? "it was unreadable or from another version of Variset" : "there was none yet");
        }
        String identity = SchemaVersion.identity(c);
        if (!identity.equals(data.get(ARCHIVE_KEY))) {
            return rebuild(c, progress, "it was built from another archive");
        }
        if (!shared && idx == db) {
            return new IndexSync(IndexSync.Action.CURRENT, 0, "", db);
        }
        if (!shared && idx > db) {
            return rebuild(c, progress, "it was ahead of the archive (was the archive restored from a backup?)");
        }
        return catchUp(c, idx, db, identity, progress);
    }

    /** Builds the index again from every route of the database. */
    public IndexSync rebuild(Connection c, IndexProgress progress, String reason) {
        long db = ChangeLog.stamp(c);
        Map<String, SettingsTimeline> timelines = timelines(c);
        long total = count(c);
        long[] done = {0};
        if (stamp() < 0) {
            clear();
        }
        try (IndexWriter w = writer(IndexWriterConfig.OpenMode.CREATE);
                OverlappedChunks<RouteRecord> lane = new OverlappedChunks<>("variset-indexer", chunk -> {
                    for (RouteRecord r : chunk) {
                        add(w, r, timelines, false);
                    }
                    done[0] += chunk.size();
                    progress.indexed(done[0], total);
                })) {
            // The database is read for the next chunk while the last one is being indexed.
            new RouteReader(c).forEachChunk(RouteFilter.all(), CHUNK, lane::submit);
            lane.finish();
            commit(w, db, SchemaVersion.identity(c));
        } catch (IOException e) {
            throw failure(e);
        }
        return new IndexSync(IndexSync.Action.REBUILT, done[0], reason, db);
    }

    private IndexSync catchUp(Connection c, long from, long to, String identity, IndexProgress progress) {
        List<Long> changed = ChangeLog.changedSince(c, from, to);
        if (changed.isEmpty()) {
            // Nothing to apply. On a shared archive the xmin moves with every transaction of every client; keeping
            // the older stamp costs nothing (the changes after it are the ones read next time) and spares a commit.
            return new IndexSync(IndexSync.Action.CURRENT, 0, "", from);
        }
        Map<String, SettingsTimeline> timelines = timelines(c);
        RouteReader reader = new RouteReader(c);
        try (IndexWriter w = writer(IndexWriterConfig.OpenMode.CREATE_OR_APPEND)) {
            for (int i = 0; i < changed.size(); i += CHUNK) {
                List<Long> ids = changed.subList(i, Math.min(changed.size(), i + CHUNK));
                Set<Long> present = new HashSet<>();
                for (RouteRecord r : reader.read(RouteFilter.all().withIds(ids))) {
                    present.add(r.id());
                    add(w, r, timelines, true);
                }
                for (Long id : ids) {
                    if (!present.contains(id)) {
                        w.deleteDocuments(new Term(SearchFields.ID, Long.toString(id)));
                    }
                }
                progress.indexed(Math.min(changed.size(), i + CHUNK), changed.size());
            }
            commit(w, to, identity);
        } catch (IOException e) {
            throw failure(e);
        }
        return new IndexSync(IndexSync.Action.CAUGHT_UP, changed.size(), "", to);
    }

    /** Adds a route's document; {@code replace} when the index may hold an older one (not in a rebuild). */
    private void add(IndexWriter w, RouteRecord r, Map<String, SettingsTimeline> timelines, boolean replace) {
        try {
            Document d =
                    facets.build(RouteDocuments.of(r, timelines.get(r.gym()).on(r.setOn())));
            if (replace) {
                w.updateDocument(new Term(SearchFields.ID, Long.toString(r.id())), d);
            } else {
                w.addDocument(d);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Map<String, SettingsTimeline> timelines(Connection c) {
        SettingsReader settings = new SettingsReader(c);
        Map<String, SettingsTimeline> out = new HashMap<>();
        for (GymRecord g : new ArchiveCatalog(c).gyms()) {
            out.put(g.name(), new SettingsTimeline(settings.history(g.id())));
        }
        return out;
    }

    private static long count(Connection c) {
        return new ArchiveCatalog(c).routeCount();
    }

    private IndexWriter writer(IndexWriterConfig.OpenMode mode) throws IOException {
        IndexWriterConfig cfg =
                new IndexWriterConfig(new TextAnalyzer()).setOpenMode(mode).setRAMBufferSizeMB(64);
        return new IndexWriter(directory, cfg);
    }

    private void commit(IndexWriter w, long stamp, String archive) throws IOException {
        Map<String, String> data = new HashMap<>();
        data.put(FORMAT_KEY, FORMAT);
        data.put(STAMP_KEY, Long.toString(stamp));
        data.put(ARCHIVE_KEY, archive);
        w.setLiveCommitData(data.entrySet());
        try {
            w.commit();
        } finally {
            commits.incrementAndGet();
        }
    }

    /** Deletes every file of an index that cannot be read, so that it can be built afresh. */
    private void clear() {
        try {
            for (String f : directory.listAll()) {
                if (!f.equals(IndexWriter.WRITE_LOCK_NAME)) {
                    directory.deleteFile(f);
                }
            }
        } catch (IOException e) {
            throw failure(e);
        } finally {
            commits.incrementAndGet();
        }
    }

    private boolean exists() {
        try {
            return directory.listAll().length > 0;
        } catch (IOException e) {
            return false;
        }
    }

    /**
     * Searches. The index should be in step with the database ({@link #sync}) first.
     *
     * @throws QuerySyntaxException for a query that cannot be read, saying where and what was expected
     */
    public SearchHits search(SearchRequest r, org.variset.archive.vocabulary.Vocabulary vocabulary) {
        org.apache.lucene.search.Query q = SearchQueries.of(r, vocabulary);
        try {
            return SearchQueries.run(new org.apache.lucene.search.IndexSearcher(reader()), q, r, facets);
        } catch (IOException e) {
            throw new ArchiveException(
                    ArchiveException.Problem.DAMAGED,
                    "Cannot read the search index: " + e.getMessage(),
                    org.variset.archive.problem.Remedy.of(org.variset.archive.problem.Remedy.Kind.REBUILD_INDEX),
                    e);
        }
    }

    /**
     * Routes that share something with a route: a hand hold of the same type facing the same way, or a move, in the
     * same discipline; the most alike first by the index's scoring (BM25). Callers score them exactly themselves.
     *
     * @return up to {@code n} route ids, never the route's own
     */
    public List<Long> candidates(RouteRecord route, org.variset.archive.vocabulary.Vocabulary vocabulary, int n) {
        org.apache.lucene.search.Query q = Candidates.of(route, vocabulary);
        if (q == null) {
            return List.of();
        }
        try {
            org.apache.lucene.search.IndexSearcher s = new org.apache.lucene.search.IndexSearcher(reader());
            List<Long> out = new ArrayList<>();
            org.apache.lucene.index.StoredFields stored = s.storedFields();
            for (org.apache.lucene.search.ScoreDoc d : s.search(q, n).scoreDocs) {
                out.add(Long.parseLong(stored.document(d.doc).get(SearchFields.ID)));
            }
            return out;
        } catch (IOException e) {
            throw new ArchiveException(
                    ArchiveException.Problem.DAMAGED,
                    "Cannot read the search index: " + e.getMessage(),
                    org.variset.archive.problem.Remedy.of(org.variset.archive.problem.Remedy.Kind.REBUILD_INDEX),
                    e);
        }
    }

    /**
     * What the index holds, checked by Lucene's {@code CheckIndex} (every segment read and verified).
     *
     * @param exists whether there is an index at all
     * @param clean whether CheckIndex found it sound
     * @param detail what CheckIndex reported, in short
     * @param stamp the change stamp it carries, or -1
     * @param ids the route ids of its documents (empty when it cannot be read)
     */
    public record Health(boolean exists, boolean clean, String detail, long stamp, java.util.Set<Long> ids) {}

    /** Checks the index with Lucene's CheckIndex and lists its documents. */
    public Health health() {
        try {
            if (!DirectoryReader.indexExists(directory)) {
                return new Health(false, false, "there is no index", -1, java.util.Set.of());
            }
            org.apache.lucene.index.CheckIndex.Status status;
            try (org.apache.lucene.index.CheckIndex ci = new org.apache.lucene.index.CheckIndex(directory)) {
                ci.setThreadCount(1);
                status = ci.checkIndex();
            }
            String detail = status.clean
                    ? status.numSegments + " segments, every one read and verified"
                    : "CheckIndex found problems in " + status.numBadSegments + " of " + status.numSegments
                            + " segments";
            return new Health(
                    true,
                    status.clean,
                    detail,
                    stamp(),
                    status.clean ? new java.util.HashSet<>(ids()) : java.util.Set.of());
        } catch (IOException | RuntimeException e) {
            return new Health(true, false, "cannot be read: " + e.getMessage(), -1, java.util.Set.of());
        }
    }

    /** The current reader: opened once, reopened only when a commit has changed the index since. */
    private synchronized DirectoryReader reader() throws IOException {
        long now = commits.get();
        if (reader == null) {
            reader = DirectoryReader.open(directory);
            readerAt = now;
        } else if (readerAt != now) {
            readerAt = now;
            DirectoryReader newer = DirectoryReader.openIfChanged(reader);
            if (newer != null) {
                reader.close();
                reader = newer;
            }
        }
        return reader;
    }

    /** The Lucene directory, for searching and checking. */
    Directory directory() {
        return directory;
    }

    /** The shared facets configuration. */
    FacetsConfig facetsConfig() {
        return facets;
    }

    private static ArchiveException failure(IOException e) {
        return new ArchiveException(
                ArchiveException.Problem.DAMAGED,
                "Cannot write the search index: " + e.getMessage(),
                org.variset.archive.problem.Remedy.of(org.variset.archive.problem.Remedy.Kind.REBUILD_INDEX),
                e);
    }

    @Override
    public synchronized void close() {
        try {
            if (reader != null) {
                reader.close();
                reader = null;
            }
            directory.close();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Ids of the routes in the index (for checks and tests). */
    List<Long> ids() throws IOException {
        List<Long> out = new ArrayList<>();
        try (DirectoryReader r = DirectoryReader.open(directory)) {
            org.apache.lucene.index.StoredFields stored = r.storedFields();
            org.apache.lucene.util.Bits live = org.apache.lucene.index.MultiBits.getLiveDocs(r);
            for (int i = 0; i < r.maxDoc(); i++) {
                if (live == null || live.get(i)) {
                    out.add(Long.parseLong(stored.document(i).get(SearchFields.ID)));
                }
            }
        }
        return out;
    }
}
