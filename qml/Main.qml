pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Qt.labs.settings
import Pitchloop

// The main window: a side bar of screens and the current screen. Navigation only; the screens
// get the club session from here and ask for each other through signals.
ApplicationWindow {
    id: root

    required property ClubSession session
    property int currentPage: 0
    /// Which layer of words the screens speak: plain sentences for the coach (true) or the
    /// analyst's numbers. Remembered, so the layer last chosen is the one the app opens in.
    property bool plainWords: true
    readonly property var pages: [
        { name: "season", title: qsTr("Season"), shortcut: "Ctrl+1" },
        { name: "import", title: qsTr("Load matches"), shortcut: "Ctrl+2" },
        { name: "targets", title: qsTr("Season targets"), shortcut: "Ctrl+3" },
        { name: "debrief", title: qsTr("Match debrief"), shortcut: "Ctrl+4" },
        { name: "zone", title: qsTr("Zone trend"), shortcut: "Ctrl+5" },
        { name: "drills", title: qsTr("Drill notes"), shortcut: "Ctrl+6" },
        { name: "focuses", title: qsTr("Focuses"), shortcut: "Ctrl+7" },
        { name: "planner", title: qsTr("Week planner"), shortcut: "Ctrl+8" },
        { name: "settings", title: qsTr("Settings"), shortcut: "Ctrl+9" }
    ]
    readonly property int pageCount: pages.length
    readonly property var pageNames: pages.map(page => page.name)

    // Screens ask for each other by name, so the order of `pages` is free to change.
    function showPage(name: string) {
        const index = pageNames.indexOf(name)
        if (index >= 0)
            currentPage = index
    }

    function openDebrief(matchId: string) {
        debriefPage.showMatch(matchId)
        showPage("debrief")
    }

    function openZone(metricId: string, band: int, lane: int, matchId: string) {
        zonePage.show(metricId, band, lane, matchId)
        showPage("zone")
    }

    // The moments behind the debrief's chosen zone; false when no zone is chosen (self-test and
    // screenshots).
    function openDebriefMoments(): bool {
        return debriefPage.openSelectedMoments()
    }

    // The zone page opened on two sets of matches compared (screenshots).
    function openComparison() {
        zonePage.showComparison()
        showPage("zone")
    }

    // The zone page opened on the moments behind a zone's number (two clicks from a debrief).
    function openMoments(metricId: string, band: int, lane: int, matchId: string) {
        zonePage.showMoments(metricId, band, lane, matchId)
        showPage("zone")
    }

    // Opens a table in the mapping assistant of Load matches (a file path).
    function mapTable(path: string) {
        showPage("import")
        importPage.mapTable(path)
    }

    // Opens a focus on a flagged zone (band 0, lane 0: the whole pitch) after a match.
    function openFocus(metricId: string, band: int, lane: int, matchId: string) {
        focusesPage.openFromZone(metricId, band, lane, matchId)
        showPage("focuses")
    }

    width: 1280
    height: 800
    minimumWidth: 1100
    minimumHeight: 720
    visible: true
    title: session.clubName.length > 0 ? qsTr("%1 — Pitchloop").arg(session.clubName) : "Pitchloop"
    color: Theme.window
    font.family: Theme.fontFamily
    font.pixelSize: Theme.fontBody

    Settings {
        category: "window"
        property alias width: root.width
        property alias height: root.height
        property alias currentPage: root.currentPage
    }
    Settings {
        category: "words"
        property alias plainWords: root.plainWords
    }

    Repeater {
        model: root.pages
        delegate: Item {
            id: binding
            required property var modelData
            required property int index
            Shortcut {
                sequence: binding.modelData.shortcut
                context: Qt.ApplicationShortcut
                onActivated: root.currentPage = binding.index
            }
        }
    }

    RowLayout {
        anchors.fill: parent
        spacing: 0

        Rectangle {
            Layout.preferredWidth: Theme.sidebarWidth
            Layout.fillHeight: true
            color: Theme.sidebar

            ColumnLayout {
                anchors.fill: parent
                anchors.topMargin: Theme.margin
                anchors.bottomMargin: Theme.gapLarge
                spacing: 2

                Label {
                    Layout.leftMargin: Theme.gapLarge
                    text: "Pitchloop"
                    color: "#ffffff"
                    font.pixelSize: Theme.fontTitle + 2
                    font.bold: true
                }
                Label {
                    Layout.leftMargin: Theme.gapLarge
                    Layout.bottomMargin: Theme.margin
                    Layout.maximumWidth: Theme.sidebarWidth - 2 * Theme.gapLarge
                    text: root.session.clubName
                    color: Theme.sidebarText
                    elide: Text.ElideRight
                }

                Repeater {
                    model: root.pages
                    delegate: NavButton {
                        required property var modelData
                        required property int index
                        Layout.fillWidth: true
                        Layout.leftMargin: Theme.gap
                        Layout.rightMargin: Theme.gap
                        title: modelData.title
                        shortcutText: modelData.shortcut
                        current: root.currentPage === index
                        onClicked: root.currentPage = index
                    }
                }

                Item { Layout.fillHeight: true }

                // The layer of words, for every screen at once (also in Settings).
                Label {
                    Layout.leftMargin: Theme.gapLarge
                    text: qsTr("Words")
                    color: Theme.sidebarMuted
                    font.pixelSize: Theme.fontSmall
                }
                RowLayout {
                    Layout.leftMargin: Theme.gap
                    Layout.rightMargin: Theme.gap
                    Layout.bottomMargin: Theme.gap
                    spacing: 4
                    Repeater {
                        model: [{ plain: true, text: qsTr("Plain words") }, { plain: false, text: qsTr("Numbers") }]
                        delegate: Button {
                            required property var modelData
                            objectName: modelData.plain ? "plainWordsButton" : "numbersButton"
                            Layout.fillWidth: true
                            text: modelData.text
                            checkable: true
                            checked: root.plainWords === modelData.plain
                            font.bold: checked
                            onClicked: root.plainWords = modelData.plain
                            ToolTip.visible: hovered
                            ToolTip.delay: 500
                            ToolTip.text: modelData.plain
                                          ? qsTr("Each zone in a sentence; the numbers when you hover it")
                                          : qsTr("Values, intervals and P(miss) in columns; the sentence when you hover it")
                        }
                    }
                }

                Label {
                    visible: root.session.demo
                    Layout.leftMargin: Theme.gapLarge
                    Layout.rightMargin: Theme.gapLarge
                    Layout.fillWidth: true
                    text: qsTr("Demo club: invented data. Open your own club file in Settings (Ctrl+9).")
                    wrapMode: Text.WordWrap
                    color: Theme.watch
                    font.pixelSize: Theme.fontSmall
                }
                Label {
                    visible: root.session.errorString.length > 0
                    Layout.leftMargin: Theme.gapLarge
                    Layout.rightMargin: Theme.gapLarge
                    Layout.fillWidth: true
                    text: root.session.errorString
                    wrapMode: Text.WordWrap
                    color: "#ffb68a"
                    font.pixelSize: Theme.fontSmall
                }
                Label {
                    Layout.leftMargin: Theme.gapLarge
                    Layout.rightMargin: Theme.gapLarge
                    Layout.topMargin: Theme.gap
                    Layout.fillWidth: true
                    text: root.session.clubFile
                    elide: Text.ElideMiddle
                    color: Theme.sidebarMuted
                    font.pixelSize: Theme.fontSmall
                }
            }
        }

        StackLayout {
            Layout.fillWidth: true
            Layout.fillHeight: true
            currentIndex: root.currentPage

            HomePage {
                plainWords: root.plainWords
                session: root.session
                onOpenDebrief: matchId => root.openDebrief(matchId)
                onOpenZone: (metricId, band, lane, matchId) => root.openZone(metricId, band, lane, matchId)
                onOpenPage: name => root.showPage(name)
            }
            ImportPage {
                id: importPage
                session: root.session
                onOpenDebrief: matchId => root.openDebrief(matchId)
                onShowRequested: root.showPage("import")
            }
            TargetsPage {
                plainWords: root.plainWords
                session: root.session
            }
            DebriefPage {
                plainWords: root.plainWords
                id: debriefPage
                session: root.session
                onOpenZone: (metricId, band, lane, matchId) => root.openZone(metricId, band, lane, matchId)
                onOpenMoments: (metricId, band, lane, matchId) => root.openMoments(metricId, band, lane, matchId)
                onOpenFocus: (metricId, band, lane, matchId) => root.openFocus(metricId, band, lane, matchId)
            }
            ZonePage {
                plainWords: root.plainWords
                id: zonePage
                session: root.session
            }
            DrillsPage {
                session: root.session
            }
            FocusesPage {
                plainWords: root.plainWords
                id: focusesPage
                session: root.session
                onOpenMoments: (metricId, band, lane, matchId) => root.openMoments(metricId, band, lane, matchId)
            }
            PlannerPage {
                plainWords: root.plainWords
                session: root.session
            }
            SettingsPage {
                plainWords: root.plainWords
                onPlainWordsChosen: plain => root.plainWords = plain
                session: root.session
            }
        }
    }

    // Match files dropped anywhere on the window are loaded on the import page.
    FileDropArea {
        anchors.fill: parent
        onFilesDropped: urls => {
            root.showPage("import")
            importPage.load(urls)
        }
    }
}
