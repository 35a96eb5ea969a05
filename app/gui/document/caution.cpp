#include "document/caution.h"

#include <QCoreApplication>

namespace cw::gui {

QString cautionText() {
  return QCoreApplication::translate(
      "Caution",
      "Results are conceptual-design estimates. For anything that affects flight safety, "
      "defer to the engine manufacturer's data, your organisation's procedures and "
      "licensed engineering practice.");
}

}  // namespace cw::gui
