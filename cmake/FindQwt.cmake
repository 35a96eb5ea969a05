# FindQwt: locate Qwt 6.x built for Qt 6.
#
# Qwt's own pkg-config file names Qt 5 modules, so it is not used. Looks in
#   - QWT_ROOT (cache or environment), then the prefix that scripts/setup.sh installs to,
#   - the system (distributions that package Qwt for Qt 6 call it qwt-qt6).
# Defines the imported target Qwt::Qwt and Qwt_FOUND, Qwt_VERSION.

set(_qwt_hints
  ${QWT_ROOT} $ENV{QWT_ROOT} $ENV{CYCLEWRIGHT_QWT_PREFIX}
  /opt/cyclewright/qwt-6.3.0-qt6)

find_path(Qwt_INCLUDE_DIR
  NAMES qwt_plot.h
  HINTS ${_qwt_hints}
  PATH_SUFFIXES include include/qwt-qt6 include/qt6/qwt include/qwt
  NO_CMAKE_SYSTEM_PATH)
find_path(Qwt_INCLUDE_DIR
  NAMES qwt_plot.h
  PATH_SUFFIXES qwt-qt6 qt6/qwt)

find_library(Qwt_LIBRARY
  NAMES qwt-qt6 qwt
  HINTS ${_qwt_hints}
  PATH_SUFFIXES lib lib64
  NO_CMAKE_SYSTEM_PATH)
find_library(Qwt_LIBRARY NAMES qwt-qt6)

if(Qwt_INCLUDE_DIR AND EXISTS "${Qwt_INCLUDE_DIR}/qwt_global.h")
  file(STRINGS "${Qwt_INCLUDE_DIR}/qwt_global.h" _qwt_version_line
       REGEX "^#define[ \t]+QWT_VERSION_STR[ \t]+\"[0-9.]+\"")
  string(REGEX REPLACE ".*\"([0-9.]+)\".*" "\\1" Qwt_VERSION "${_qwt_version_line}")
endif()

include(FindPackageHandleStandardArgs)
find_package_handle_standard_args(Qwt
  REQUIRED_VARS Qwt_LIBRARY Qwt_INCLUDE_DIR
  VERSION_VAR Qwt_VERSION)

if(Qwt_FOUND AND NOT TARGET Qwt::Qwt)
  add_library(Qwt::Qwt SHARED IMPORTED)
  set_target_properties(Qwt::Qwt PROPERTIES
    IMPORTED_LOCATION "${Qwt_LIBRARY}"
    INTERFACE_INCLUDE_DIRECTORIES "${Qwt_INCLUDE_DIR}")
  # Qwt is built with these; consumers need them on the include path.
  target_link_libraries(Qwt::Qwt INTERFACE Qt6::Widgets Qt6::PrintSupport Qt6::Svg Qt6::Concurrent)
  get_filename_component(_qwt_libdir "${Qwt_LIBRARY}" DIRECTORY)
  set(Qwt_LIBRARY_DIR "${_qwt_libdir}")
endif()

mark_as_advanced(Qwt_INCLUDE_DIR Qwt_LIBRARY)
