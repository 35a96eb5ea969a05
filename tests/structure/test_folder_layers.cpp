// The source folders form strict layers (DEVELOPERS.md, "Layers"): a file includes headers of its
// own folder or of a folder in a lower layer, never of a sibling in the same layer or of a higher
// one. This suite reads every #include of each layered source tree (core/ and app/gui) and fails on
// the first one against the order, on a folder that has no layer, and on a cycle of includes
// between the tree's files, naming the file, the line and the rule. It also checks that no core
// file includes Qt or app/.
#include <QDirIterator>
#include <QFile>
#include <QRegularExpression>
#include <QTest>

#include <map>
#include <optional>
#include <set>
#include <string>
#include <vector>

namespace {

/// One source tree and its layers, lowest first. The empty folder name stands for the files at
/// the top of the tree (main_window, main), which form the highest layer by themselves.
struct LayeredTree {
  QString root;  // relative to the source directory
  std::vector<std::vector<QString>> layers;
};

const std::vector<LayeredTree>& layeredTrees() {
  static const std::vector<LayeredTree> trees = {
      {QStringLiteral("core"),
       {{"common"},
        {"solve"},
        {"thermo", "atmosphere"},
        {"flow"},
        {"stream"},
        {"components"},
        {"engine"},
        {"network"},
        {"analysis"},
        {"evaluation"},
        {"io"},
        {"study"}}},
      {QStringLiteral("app/gui"),
       {{"document"}, {"charts", "forms", "dialogs"}, {"tables", "audit", "trade_study"}, {"startup"}, {""}}},
  };
  return trees;
}

struct Include {
  QString file;  // relative to the tree's root
  int line = 0;
  QString header;      // as written
  bool quoted = true;  // "header" rather than <header>
};

QString sourceRoot(const LayeredTree& tree) {
  return QStringLiteral(CYCLEWRIGHT_SOURCE_DIR "/") + tree.root;
}

std::vector<Include> includesUnder(const QString& root) {
  std::vector<Include> found;
  static const QRegularExpression includeLine(QStringLiteral("^\\s*#\\s*include\\s*([\"<])([^\">]+)[\">]"));
  QDirIterator it(root, {"*.h", "*.cpp", "*.h.in"}, QDir::Files, QDirIterator::Subdirectories);
  while (it.hasNext()) {
    const QString path = it.next();
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly | QIODevice::Text)) {
      qFatal("cannot read %s", qPrintable(path));
    }
    int lineNumber = 0;
    while (!file.atEnd()) {
      ++lineNumber;
      const auto match = includeLine.match(QString::fromUtf8(file.readLine()));
      if (match.hasMatch()) {
        found.push_back({QDir(root).relativeFilePath(path), lineNumber, match.captured(2),
                         match.captured(1) == QLatin1String("\"")});
      }
    }
  }
  return found;
}

/// The folder a path inside the tree lies in ("" for the tree's top).
QString folderOf(const QString& relativePath) {
  const auto slash = relativePath.indexOf(QLatin1Char('/'));
  return slash < 0 ? QString() : relativePath.left(slash);
}

/// The tree's file a quoted include names, if it names one (a generated header counts by its
/// template, common/version.h by common/version.h.in).
std::optional<QString> headerInTree(const QString& root, const Include& include) {
  if (!include.quoted) return std::nullopt;
  if (QFile::exists(root + "/" + include.header)) return include.header;
  if (QFile::exists(root + "/" + include.header + ".in")) return include.header + ".in";
  return std::nullopt;
}

QString where(const LayeredTree& tree, const Include& include) {
  return QStringLiteral("%1/%2:%3 includes \"%4\"")
      .arg(tree.root, include.file)
      .arg(include.line)
      .arg(include.header);
}

/// The first cycle of includes between the tree's files, as "a -> b -> a", or empty.
class CycleFinder {
 public:
  explicit CycleFinder(std::map<QString, std::vector<QString>> edges) : edges_(std::move(edges)) {}

  QString find() {
    for (const auto& [file, targets] : edges_) {
      if (visit(file)) return cycle_;
    }
    return {};
  }

 private:
  bool visit(const QString& file) {
    if (done_.count(file)) return false;
    for (std::size_t i = 0; i < path_.size(); ++i) {
      if (path_[i] != file) continue;
      QStringList names(path_.begin() + static_cast<std::ptrdiff_t>(i), path_.end());
      names << file;
      cycle_ = names.join(QStringLiteral(" -> "));
      return true;
    }
    path_.push_back(file);
    const auto it = edges_.find(file);
    if (it != edges_.end()) {
      for (const QString& next : it->second) {
        if (visit(next)) return true;
      }
    }
    path_.pop_back();
    done_.insert(file);
    return false;
  }

  std::map<QString, std::vector<QString>> edges_;
  std::vector<QString> path_;
  std::set<QString> done_;
  QString cycle_;
};

}  // namespace

class TestFolderLayers : public QObject {
  Q_OBJECT
 private slots:
  void everyIncludeFollowsTheLayers_data() { addTrees(); }

  void everyIncludeFollowsTheLayers() {
    QFETCH(int, treeIndex);
    const LayeredTree& tree = layeredTrees()[treeIndex];
    std::map<QString, int> layerOf;
    for (int layer = 0; layer < static_cast<int>(tree.layers.size()); ++layer) {
      for (const QString& folder : tree.layers[layer]) layerOf[folder] = layer;
    }
    const QString root = sourceRoot(tree);
    QVERIFY2(QDir(root).exists(), qPrintable(root));

    // Every folder on disk has a layer, so a new folder cannot slip past the rule.
    for (const QString& folder : QDir(root).entryList(QDir::Dirs | QDir::NoDotAndDotDot)) {
      QVERIFY2(layerOf.count(folder) == 1,
               qPrintable(tree.root + "/" + folder + " has no layer in this suite's table"));
    }

    const auto includes = includesUnder(root);
    QVERIFY(includes.size() > 100);  // the walk found the tree
    for (const Include& include : includes) {
      const auto header = headerInTree(root, include);
      const QString from = folderOf(include.file);
      if (!header) continue;  // another tree's header, or a library's
      const QString to = folderOf(*header);
      QVERIFY2(layerOf.count(from) == 1, qPrintable(where(tree, include) + ": " + tree.root + "/" + from +
                                                    " has no layer in this suite's table"));
      QVERIFY2(layerOf.count(to) == 1, qPrintable(where(tree, include) + ": " + tree.root + "/" + to +
                                                  " has no layer in this suite's table"));
      if (from == to) continue;
      const int fromLayer = layerOf.at(from);
      const int toLayer = layerOf.at(to);
      QVERIFY2(toLayer != fromLayer,
               qPrintable(where(tree, include) + ": " + from + " and " + to + " are siblings in one layer"));
      QVERIFY2(toLayer < fromLayer,
               qPrintable(where(tree, include) + ": " + (to.isEmpty() ? "the top" : to) +
                          " is in a higher layer than " + (from.isEmpty() ? "the top" : from)));
    }
  }

  /// No file reaches itself through its includes, within one folder or across folders.
  void noIncludeCycle_data() { addTrees(); }

  void noIncludeCycle() {
    QFETCH(int, treeIndex);
    const LayeredTree& tree = layeredTrees()[treeIndex];
    const QString root = sourceRoot(tree);
    std::map<QString, std::vector<QString>> edges;
    for (const Include& include : includesUnder(root)) {
      if (const auto header = headerInTree(root, include)) edges[include.file].push_back(*header);
    }
    QVERIFY(edges.size() > 50);  // the walk found the tree's includes
    const QString cycle = CycleFinder(std::move(edges)).find();
    QVERIFY2(cycle.isEmpty(), qPrintable(tree.root + ": include cycle " + cycle));
  }

  /// core/ is pure C++20 (DEVELOPERS.md, "Layout"): no Qt header, nothing of app/.
  void coreIncludesNoQtNorApp() {
    const QString root = QStringLiteral(CYCLEWRIGHT_SOURCE_DIR "/core");
    const QString app = QStringLiteral(CYCLEWRIGHT_SOURCE_DIR "/app");
    // Qt's headers: <QString>, <QtCore/QString>, <QtWidgets>, <qglobal.h> (common practice, no source).
    static const QRegularExpression qtHeader(
        QStringLiteral("^(Qt[A-Za-z]*(/|$)|Q[A-Z][A-Za-z]*$|q[a-z]+\\.h$)"));
    const auto includes = includesUnder(root);
    QVERIFY(includes.size() > 100);
    const LayeredTree core{QStringLiteral("core"), {}};
    for (const Include& include : includes) {
      QVERIFY2(!qtHeader.match(include.header).hasMatch(), qPrintable(where(core, include) + ": Qt in core"));
      QVERIFY2(!include.header.startsWith(QLatin1String("app/")),
               qPrintable(where(core, include) + ": app/ in core"));
      for (const QString& appTree : {QStringLiteral("/gui/"), QStringLiteral("/cli/")}) {
        QVERIFY2(!include.quoted || !QFile::exists(app + appTree + include.header),
                 qPrintable(where(core, include) + ": a header of app" + appTree + " in core"));
      }
    }
  }

 private:
  static void addTrees() {
    QTest::addColumn<int>("treeIndex");
    for (int i = 0; i < static_cast<int>(layeredTrees().size()); ++i) {
      QTest::newRow(qPrintable(layeredTrees()[i].root)) << i;
    }
  }
};

QTEST_GUILESS_MAIN(TestFolderLayers)
#include "test_folder_layers.moc"
