package scenario_test

import (
	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"
)

func init() {
	scenario.ErrorTextForTest = present.ErrorText
	scenario.WarningTextForTest = present.WarningText
	scenario.LinkErrorTextForTest = present.LinkErrorText
}
