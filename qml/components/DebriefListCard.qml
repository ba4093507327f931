pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// Debrief lines in their sections, most certain first, in a card: an optional note above them
// and a message when there are none. Emits which line was clicked; never changes data itself.
Card {
    id: root

    required property DebriefListModel lines
    property string note
    property string emptyText
    property string selectedMetric
    property int selectedBand: -1
    property int selectedLane: -1
    /// Plain sentences (the coach's layer) or the numbers (the analyst's).
    property bool plainWords: true

    signal lineClicked(string metricId, int band, int lane)
    signal lineDoubleClicked(string metricId, int band, int lane)

    Label {
        visible: root.note.length > 0
        Layout.fillWidth: true
        Layout.bottomMargin: Theme.gapSmall
        text: root.note
        wrapMode: Text.WordWrap
        color: Theme.textMuted
        font.pixelSize: Theme.fontSmall
    }
    Label {
        visible: root.lines.count === 0 && root.emptyText.length > 0
        Layout.fillWidth: true
        text: root.emptyText
        wrapMode: Text.WordWrap
        color: Theme.text
    }
    ListView {
        Layout.fillWidth: true
        Layout.fillHeight: true
        Layout.minimumHeight: 46
        clip: true
        model: root.lines
        boundsBehavior: Flickable.StopAtBounds
        ScrollBar.vertical: ScrollBar {}
        delegate: DebriefItemDelegate {
            width: ListView.view.width
            plainWords: root.plainWords
            selected: metricId === root.selectedMetric && band === root.selectedBand
                      && lane === root.selectedLane
            onClicked: root.lineClicked(metricId, band, lane)
            onDoubleClicked: root.lineDoubleClicked(metricId, band, lane)
        }
    }
}
