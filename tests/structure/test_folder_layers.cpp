// The source folders form strict layers (DEVELOPERS.md, "Layers"): a file includes headers of its
// own folder or of a folder in a lower layer, never of a sibling in the same layer or of a higher
// one. This suite reads every #include of a source tree and fails on the first one against the
// order, naming the file, the line and the rule.
#include <QDirIterator>
#include <QFile>
#include <QRegularExpression>
#include <QTest>

#include <map>
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
      {QStringLiteral("app/gui"),
       {{"document"}, {"charts", "forms", "dialogs"}, {"tables", "audit", "trade_study"}, {"startup"}, {""}}},
  };
  return trees;
}

struct Include {
  QString file;
  int line = 0;
  QString header;
};

std::vector<Include> includesUnder(const QString& root) {
  std::vector<Include> found;
  static const QRegularExpression includeLine(QStringLiteral("^\\s*#\\s*include\\s+\"([^\"]+)\""));
  QDirIterator it(root, {"*.h", "*.cpp"}, QDir::Files, QDirIterator::Subdirectories);
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
        found.push_back({QDir(root).relativeFilePath(path), lineNumber, match.captured(1)});
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

}  // namespace

class TestFolderLayers : public QObject {
  Q_OBJECT
 private slots:
  void everyIncludeFollowsTheLayers_data() {
    QTest::addColumn<int>("treeIndex");
    for (int i = 0; i < static_cast<int>(layeredTrees().size()); ++i) {
      QTest::newRow(qPrintable(layeredTrees()[i].root)) << i;
    }
  }

  void everyIncludeFollowsTheLayers() {
    QFETCH(int, treeIndex);
    const LayeredTree& tree = layeredTrees()[treeIndex];
    std::map<QString, int> layerOf;
    for (int layer = 0; layer < static_cast<int>(tree.layers.size()); ++layer) {
      for (const QString& folder : tree.layers[layer]) layerOf[folder] = layer;
    }
    const QString root = QStringLiteral(CYCLEWRIGHT_SOURCE_DIR "/") + tree.root;
    QVERIFY2(QDir(root).exists(), qPrintable(root));

    // Every folder on disk has a layer, so a new folder cannot slip past the rule.
    for (const QString& folder : QDir(root).entryList(QDir::Dirs | QDir::NoDotAndDotDot)) {
      QVERIFY2(layerOf.count(folder) == 1,
               qPrintable(tree.root + "/" + folder + " has no layer in this suite's table"));
    }

    const auto includes = includesUnder(root);
    QVERIFY(includes.size() > 100);  // the walk found the tree
    for (const Include& include : includes) {
      const QString from = folderOf(include.file);
      const QString to = folderOf(include.header);
      const bool headerInTree = QFile::exists(root + "/" + include.header);
      if (!headerInTree || from == to) continue;  // another tree's header, or its own folder
      const QString where = QStringLiteral("%1/%2:%3 includes \"%4\"")
                                .arg(tree.root, include.file)
                                .arg(include.line)
                                .arg(include.header);
      const int fromLayer = layerOf.at(from);
      const int toLayer = layerOf.at(to);
      QVERIFY2(toLayer != fromLayer,
               qPrintable(where + ": " + from + " and " + to + " are siblings in one layer"));
      QVERIFY2(toLayer < fromLayer, qPrintable(where + ": " + (to.isEmpty() ? "the top" : to) +
                                               " is in a higher layer than " + from));
    }
  }
};

QTEST_GUILESS_MAIN(TestFolderLayers)
#include "test_folder_layers.moc"
