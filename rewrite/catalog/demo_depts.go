package catalog

// The departments of the demo store, one function each. buildDemoDepts
// lists them in the order the seeded draw depends on.

func demoApparel() *demoDept {
	return &demoDept{
		category: "apparel", weight: 14, colourDefault: true, audiences: demoAudiences,
		brands: []string{"Drafnolo", "Vaskorin", "Pellundra", "Quandeko", "Korvane"},
		blurbs: []string{
			"Machine wash cold and tumble dry low.",
			"Cut for an easy fit with room to layer.",
			"Part of the store's year-round basics.",
			"Garment dyed for a soft, lived-in feel.",
		},
		kinds: []*demoKind{
			stock("sweater", 4500, 14900).mat("merino", "lambswool", "cashmere", "cotton", "wool").pat("solid", "cable knit", "fair isle", "striped", "ribbed").sil("crew", "v-neck", "turtleneck", "mock neck", "relaxed"),
			stock("cardigan", 4900, 13900).mat("merino", "wool", "cotton", "cashmere").pat("solid", "cable knit", "ribbed", "heathered").sil("v-neck", "button front", "oversized", "longline"),
			stock("t-shirt", 1200, 3900).mat("cotton", "organic cotton", "pima cotton", "modal").pat("solid", "striped", "graphic", "heathered").sil("crew", "v-neck", "slim", "relaxed", "oversized"),
			stock("long sleeve tee", 1800, 4900).mat("cotton", "organic cotton", "merino").pat("solid", "striped", "breton stripe").sil("crew", "slim", "relaxed"),
			stock("flannel shirt", 2900, 6900).mat("flannel", "cotton", "organic cotton").pat("plaid", "buffalo check", "tartan", "check").sil("classic fit", "slim", "relaxed", "button front"),
			stock("dress shirt", 3500, 8900).mat("cotton", "poplin", "oxford cloth", "linen").pat("solid", "pinstripe", "gingham", "check").sil("slim", "classic fit", "button front"),
			stock("hoodie", 3500, 8900).mat("cotton", "fleece", "recycled polyester", "organic cotton").pat("solid", "colour block", "heathered", "graphic").sil("zip", "relaxed", "oversized", "half zip"),
			stock("rain jacket", 6900, 22900).mat("nylon", "recycled polyester", "polyester").pat("solid", "colour block").sil("hooded", "waterproof", "zip", "lined"),
			stock("puffer jacket", 8900, 27900).mat("nylon", "down", "recycled polyester").pat("solid", "quilted").sil("hooded", "insulated", "longline", "cropped"),
			stock("parka", 12900, 34900).mat("nylon", "wool", "polyester").pat("solid").sil("hooded", "insulated", "waterproof", "longline"),
			stock("jeans", 4900, 12900).mat("denim").pat("dark wash", "mid wash", "light wash", "distressed", "stone wash").sil("slim", "straight leg", "bootcut", "skinny", "wide leg", "high waisted", "relaxed", "tapered"),
			stock("chinos", 3900, 8900).mat("cotton", "twill", "linen").pat("solid").sil("slim", "tapered", "straight leg", "relaxed"),
			stock("leggings", 2500, 7900).mat("spandex", "nylon", "cotton").pat("solid", "printed", "camouflage").sil("high waisted", "cropped", "ankle length").aud("women", "kids"),
			stock("joggers", 2900, 6900).mat("cotton", "fleece", "recycled polyester").pat("solid", "heathered").sil("tapered", "relaxed", "drawstring"),
			stock("shorts", 1900, 5500).mat("cotton", "linen", "nylon", "twill").pat("solid", "striped", "check").sil("relaxed", "drawstring", "high waisted"),
			stock("dress", 4500, 16900).mat("cotton", "linen", "viscose", "silk", "jersey").pat("floral", "polka dot", "solid", "gingham", "paisley").sil("a-line", "wrap", "shift", "midi", "maxi", "tiered").aud("women", "kids"),
			stock("skirt", 3500, 9900).mat("cotton", "denim", "linen", "wool", "satin").pat("solid", "floral", "plaid", "houndstooth").sil("a-line", "midi", "mini", "pleated").aud("women", "kids"),
			stock("blouse", 3900, 11900).mat("silk", "viscose", "chiffon", "cotton").pat("solid", "floral", "polka dot").sil("puff sleeve", "v-neck", "wrap", "long sleeve").aud("women"),
			stock("pajamas", 2900, 7900).mat("cotton", "flannel", "modal", "satin").pat("plaid", "striped", "solid", "star print").sil("relaxed", "button front"),
			stock("socks", 800, 2400).mat("merino", "cotton", "wool", "nylon").pat("solid", "striped", "argyle", "ribbed"),
		},
	}
}

func demoFootwear() *demoDept {
	return &demoDept{
		category: "footwear", weight: 8, colourDefault: true, audiences: demoAudiences,
		brands: []string{"Zubrillo", "Fenwoddle", "Okkaram", "Tellisk"},
		blurbs: []string{
			"Cushioned footbed for all-day wear.",
			"True to size; between sizes, take the larger.",
			"Free returns on unworn pairs.",
		},
		kinds: []*demoKind{
			stock("sneaker", 4900, 13900).mat("canvas", "leather", "suede", "mesh").pat("solid", "two tone", "colour block").sil("low top", "high top", "lace-up", "slip-on"),
			stock("running shoe", 7900, 17900).mat("mesh", "recycled polyester").pat("solid", "colour block").sil("lace-up"),
			stock("trail running shoe", 8900, 18900).mat("mesh", "nylon").pat("solid", "colour block").sil("lace-up", "lug sole", "waterproof"),
			stock("hiking boot", 11900, 24900).mat("leather", "nubuck", "suede", "nylon").pat("solid").sil("lace-up", "waterproof", "lug sole", "insulated"),
			stock("chelsea boot", 9900, 22900).mat("leather", "suede").pat("solid").sil("slip-on", "lug sole", "block heel", "round toe"),
			stock("ankle boot", 7900, 19900).mat("leather", "suede", "faux leather").pat("solid").sil("block heel", "pointed toe", "lace-up", "platform"),
			stock("work boot", 9900, 21900).mat("leather", "full grain leather").pat("solid").sil("steel toe", "composite toe", "waterproof", "lace-up").aud("women", "men", "unisex"),
			stock("rain boot", 3900, 11900).mat("rubber").pat("solid", "polka dot").sil("slip-on", "lined"),
			stock("loafer", 7900, 18900).mat("leather", "suede").pat("solid").sil("slip-on", "round toe"),
			stock("sandal", 2900, 8900).mat("leather", "rubber", "eva foam").pat("solid").sil("ankle strap", "platform", "slingback"),
			stock("slipper", 1900, 5900).mat("sherpa", "wool", "faux fur", "suede").pat("solid", "plaid").sil("slip-on", "lined"),
			stock("ballet flat", 4900, 12900).mat("leather", "suede", "patent leather").pat("solid").sil("round toe", "pointed toe", "slip-on").aud("women", "kids"),
		},
	}
}

func demoAccessories() *demoDept {
	return &demoDept{
		category: "accessories", weight: 7, colourDefault: true,
		brands: []string{"Snarrowby", "Hobblequin", "Yarrobel", "Vornquist"},
		blurbs: []string{
			"Finished by hand in small batches.",
			"A year's warranty on stitching and hardware.",
			"Sized to go everywhere.",
		},
		kinds: []*demoKind{
			stock("backpack", 3900, 16900).mat("nylon", "canvas", "recycled polyester", "leather").sil("water resistant", "padded").m("capacity", "15 L", "20 L", "25 L", "30 L", "40 L").titled(demoTitleBefore),
			stock("duffel bag", 4900, 18900).mat("canvas", "nylon", "leather").m("capacity", "30 L", "40 L", "60 L", "90 L").titled(demoTitleBefore),
			stock("laptop sleeve", 1900, 5900).mat("neoprene", "felt", "leather").sil("padded", "zip").m("laptop_diagonal", "13 in", "14 in", "15.6 in", "16 in"),
			stock("crossbody bag", 3900, 16900).mat("leather", "faux leather", "canvas", "nylon").sil("adjustable", "zip"),
			stock("tote bag", 1900, 12900).mat("canvas", "leather", "jute", "cotton").pat("solid", "striped", "printed"),
			stock("wallet", 2900, 8900).mat("leather", "full grain leather", "faux leather").sil("zip"),
			stock("belt", 2500, 7900).mat("leather", "full grain leather", "suede", "canvas").sil("reversible", "adjustable"),
			stock("watch", 9900, 39900).mat("stainless steel", "titanium", "leather").sil("water resistant", "round").m("case_diameter", "36 mm", "38 mm", "40 mm", "42 mm", "44 mm").titled(demoTitleBefore),
			stock("beanie", 1500, 4900).mat("merino", "wool", "cashmere", "acrylic").pat("solid", "cable knit", "ribbed", "fair isle"),
			stock("baseball cap", 1800, 3900).mat("cotton", "twill", "nylon", "wool").pat("solid", "embroidered", "logo").sil("adjustable"),
			stock("scarf", 2500, 12900).mat("wool", "cashmere", "merino", "silk").pat("solid", "plaid", "tartan", "herringbone", "paisley"),
			stock("gloves", 1900, 7900).mat("leather", "wool", "fleece").sil("insulated", "lined"),
			stock("umbrella", 1500, 4900).mat("nylon", "polyester").pat("solid", "polka dot", "striped").sil("foldable").m("canopy_diameter", "42 in", "46 in", "54 in", "62 in"),
			stock("sunglasses", 2900, 14900).mat("resin", "polycarbonate", "titanium").pat("solid", "tortoiseshell").sil("round", "square", "oval"),
		},
	}
}

func demoHome() *demoDept {
	return &demoDept{
		category: "home", weight: 9, colourDefault: true,
		brands: []string{"Tuvenko", "Nuddleford", "Wexomar", "Zelkari"},
		blurbs: []string{
			"Designed in-house for Hollowmere General.",
			"Free returns within 60 days.",
			"Pairs with the rest of the store's home range.",
			"Packed in recycled card.",
		},
		kinds: []*demoKind{
			stock("rug", 4900, 59900).mat("wool", "jute", "cotton", "polypropylene", "sisal").pat("solid", "persian", "geometric", "medallion", "southwestern", "abstract", "striped").dims("width length", "2 ft|3 ft", "3 ft|5 ft", "4 ft|6 ft", "5 ft|8 ft", "6 ft|9 ft", "8 ft|10 ft", "9 ft|12 ft"),
			stock("rug runner", 3900, 19900).mat("wool", "jute", "cotton", "polypropylene").pat("solid", "persian", "geometric", "striped").dims("width length", "2 ft|6 ft", "2 ft|8 ft", "2.5 ft|10 ft", "3 ft|12 ft"),
			stock("bath mat", 1500, 4900).mat("cotton", "microfibre", "memory foam", "bamboo").pat("solid", "striped", "waffle knit").sil("non slip").dims("width length", "17 in|24 in", "20 in|32 in", "21 in|34 in", "24 in|40 in"),
			stock("cushion", 1900, 6900).mat("linen", "velvet", "cotton", "boucle", "wool").pat("solid", "striped", "geometric", "embroidered", "floral").dims("width height", "16 in|16 in", "18 in|18 in", "20 in|12 in", "20 in|20 in", "22 in|22 in"),
			stock("throw", 2900, 14900).mat("wool", "cotton", "fleece", "sherpa", "cashmere", "chenille").pat("solid", "herringbone", "plaid", "cable knit").dims("width length", "50 in|60 in", "50 in|70 in", "60 in|80 in"),
			stock("bath towel", 1200, 3900).mat("cotton", "egyptian cotton", "organic cotton", "bamboo").pat("solid", "striped").dims("width length", "27 in|52 in", "30 in|56 in", "30 in|58 in", "35 in|70 in"),
			stock("curtain", 2500, 8900).mat("linen", "cotton", "velvet", "polyester").pat("solid", "floral", "striped", "geometric").dims("width length", "50 in|63 in", "50 in|84 in", "52 in|84 in", "52 in|96 in", "52 in|108 in"),
			stock("blackout curtain", 2900, 9900).mat("polyester", "velvet", "cotton").pat("solid").dims("width length", "42 in|63 in", "52 in|84 in", "52 in|96 in", "52 in|108 in"),
			stock("duvet cover", 5900, 22900).mat("cotton", "percale", "sateen", "linen", "egyptian cotton").pat("solid", "striped", "floral", "gingham").bedSized(),
			stock("sheet set", 4900, 19900).mat("percale", "sateen", "linen", "egyptian cotton", "bamboo", "flannel").pat("solid", "striped").bedSized(),
			stock("quilt", 7900, 24900).mat("cotton", "linen").pat("solid", "floral", "geometric").bedSized(),
			stock("pillow", 1900, 8900).mat("down", "feather", "memory foam", "polyester").plain("white").dims("width length", "20 in|26 in", "20 in|30 in", "20 in|36 in"),
			stock("candle", 1200, 4500).dims("diameter height", "3 in|3 in", "3 in|4 in", "3 in|6 in", "4 in|4 in"),
			stock("vase", 1900, 8900).mat("ceramic", "glass", "stoneware", "porcelain").pat("solid", "textured").m("height", "6 in", "8 in", "10 in", "12 in", "16 in"),
			stock("planter", 1500, 7900).mat("ceramic", "earthenware", "concrete", "stoneware").pat("solid", "textured").m("diameter", "4 in", "6 in", "8 in", "10 in", "12 in"),
			stock("storage box", 1200, 4900).mat("polypropylene", "canvas", "seagrass").m("capacity", "10 L", "20 L", "35 L", "50 L", "70 L"),
			stock("trash can", 1900, 12900).mat("stainless steel", "plastic").m("capacity", "2 gal", "4 gal", "8 gal", "13 gal", "16 gal").titled(demoTitleBefore),
			stock("wall clock", 2500, 8900).mat("wood", "metal", "glass").sil("round").m("diameter", "10 in", "12 in", "14 in", "18 in"),
			stock("mirror", 4900, 29900).mat("glass", "metal", "rattan", "oak").sil("rectangular", "oval", "arched", "wall mounted").dims("width height", "18 in|24 in", "24 in|36 in", "30 in|40 in", "22 in|65 in"),
			stock("table lamp", 3900, 14900).mat("ceramic", "brass", "glass", "rattan"),
			stock("floor lamp", 5900, 19900).mat("brass", "steel", "rattan"),
			stock("vacuum filter", 1200, 3900).colourless().fits(demoVacuums),
			stock("air filter", 1200, 3900).colourless().dims("width height depth", "14 in|20 in|1 in", "16 in|20 in|1 in", "16 in|25 in|1 in", "20 in|20 in|1 in", "20 in|25 in|1 in").titled(demoTitleAfter),
			stock("space heater", 3900, 12900).plain("white", "black", "grey").m("power", "750 W", "1500 W"),
			stock("hair dryer", 2900, 12900).plain("white", "black", "pink").m("power", "1200 W", "1800 W", "1875 W"),
		},
	}
}

func demoFurniture() *demoDept {
	return &demoDept{
		category: "furniture", weight: 6, colourDefault: true,
		brands: []string{"Kribbonet", "Ulvarind", "Brellimor", "Quonderly"},
		blurbs: []string{
			"Delivery to the room of your choice.",
			"Backed by a ten-year structural guarantee.",
			"Ships in four to six weeks.",
		},
		kinds: []*demoKind{
			stock("sofa", 69900, 249900).mat("velvet", "linen", "boucle", "leather", "cotton").sil("upholstered", "tufted").m("width", "72 in", "78 in", "84 in", "90 in", "96 in"),
			stock("loveseat", 49900, 149900).mat("velvet", "linen", "boucle", "leather").sil("upholstered", "tufted").m("width", "58 in", "62 in", "66 in"),
			stock("armchair", 24900, 99900).mat("velvet", "boucle", "leather", "linen", "rattan").sil("upholstered", "wingback", "swivel", "tufted"),
			stock("dining chair", 7900, 29900).mat("oak", "walnut", "beech", "rattan", "velvet").sil("upholstered", "stackable"),
			stock("office chair", 12900, 49900).mat("mesh", "leather", "faux leather").sil("adjustable", "swivel", "padded"),
			stock("bar stool", 7900, 24900).mat("oak", "steel", "rattan", "leather").sil("swivel", "upholstered", "adjustable").m("seat_height", "26 in", "28 in", "30 in"),
			stock("counter stool", 6900, 21900).mat("oak", "steel", "rattan", "leather").sil("swivel", "upholstered").m("seat_height", "24 in", "26 in"),
			stock("coffee table", 14900, 69900).plain(demoWoodFinishes...).mat("oak", "walnut", "marble", "glass", "mango wood", "acacia").sil("rectangular", "oval").dims("length width", "36 in|20 in", "42 in|22 in", "48 in|24 in", "54 in|30 in"),
			stock("dining table", 34900, 179900).plain(demoWoodFinishes...).mat("oak", "walnut", "acacia", "pine", "reclaimed wood").sil("rectangular", "extendable", "oval").dims("length width", "60 in|36 in", "72 in|36 in", "72 in|40 in", "84 in|40 in", "96 in|42 in"),
			stock("desk", 14900, 59900).plain(demoWoodFinishes...).mat("oak", "walnut", "engineered wood", "steel").sil("l-shaped", "rectangular").dims("width depth", "42 in|20 in", "48 in|24 in", "55 in|24 in", "60 in|30 in"),
			stock("standing desk", 29900, 89900).plain(demoWoodFinishes...).mat("bamboo", "oak", "engineered wood").sil("adjustable").dims("width depth", "48 in|24 in", "55 in|28 in", "60 in|30 in", "72 in|30 in"),
			stock("bookcase", 8900, 39900).plain(demoWoodFinishes...).mat("oak", "pine", "walnut", "engineered wood").sil("freestanding", "wall mounted").m("height", "36 in", "48 in", "60 in", "72 in", "84 in"),
			stock("nightstand", 7900, 29900).plain(demoWoodFinishes...).mat("oak", "walnut", "rattan", "pine", "mango wood"),
			stock("dresser", 29900, 119900).plain(demoWoodFinishes...).mat("oak", "walnut", "pine", "mango wood", "engineered wood"),
			stock("tv stand", 14900, 59900).plain(demoWoodFinishes...).mat("oak", "walnut", "engineered wood", "rattan").m("width", "48 in", "55 in", "60 in", "70 in"),
			stock("bench", 9900, 39900).mat("oak", "pine", "acacia", "teak", "velvet").sil("upholstered").m("length", "36 in", "42 in", "48 in", "60 in"),
			stock("floating shelf", 1900, 7900).plain(demoWoodFinishes...).mat("oak", "pine", "walnut", "steel").sil("wall mounted").m("length", "24 in", "36 in", "48 in"),
		},
	}
}

func demoLumber() *demoDept {
	return &demoDept{
		// Nominal sizes are those of PS 20 (testdata/reference/lumber_ps20_sizes.tsv);
		// lengths are the usual stock lengths (common practice).
		category: "lumber", weight: 5,
		brands: []string{"Thorvendi", "Squeltor", "Vendrabo"},
		blurbs: []string{
			"Sold by the piece; grade stamped.",
			"Cut to length at the yard on request.",
			"Stored under cover and stickered to stay straight.",
		},
		kinds: []*demoKind{
			stock("stud", 350, 1500).mat("spruce pine fir", "douglas fir", "kiln dried").spec("2x3", "2x4", "2x6").m("length", "8 ft", "10 ft", "12 ft").titled(demoTitleAfter),
			stock("lumber", 300, 4500).mat("pressure treated", "spruce pine fir", "douglas fir", "kiln dried").spec("2x2", "2x4", "2x6", "2x8", "2x10", "2x12").m("length", "8 ft", "10 ft", "12 ft", "16 ft").titled(demoTitleAfter),
			stock("board", 300, 6500).mat("pine", "poplar", "oak", "maple", "cedar").spec("1x2", "1x3", "1x4", "1x6", "1x8", "1x10", "1x12").m("length", "6 ft", "8 ft", "10 ft", "12 ft").titled(demoTitleAfter),
			stock("post", 1200, 5500).mat("pressure treated", "cedar", "douglas fir").spec("4x4", "4x6").m("length", "8 ft", "10 ft", "12 ft").titled(demoTitleAfter),
			stock("fence post", 900, 3500).mat("pressure treated", "cedar").spec("4x4").m("length", "6 ft", "8 ft").titled(demoTitleAfter),
			stock("joist", 1500, 6900).mat("douglas fir", "pressure treated", "spruce pine fir").spec("2x8", "2x10", "2x12").m("length", "10 ft", "12 ft", "16 ft").titled(demoTitleAfter),
			stock("decking", 800, 4500).mat("pressure treated", "cedar").spec("2x6").m("length", "8 ft", "10 ft", "12 ft", "16 ft").titled(demoTitleAfter),
			stock("furring strip", 200, 600).mat("pine", "spruce pine fir").spec("1x2", "1x3").m("length", "8 ft").titled(demoTitleAfter),
			stock("plywood", 1900, 8900).mat("birch", "pine", "douglas fir", "hardwood").dims("width length", "2 ft|4 ft", "4 ft|8 ft").m("thickness", "0.25 in", "0.5 in", "0.75 in"),
			stock("osb", 1500, 4500).dims("width length", "4 ft|8 ft").m("thickness", "0.4375 in", "0.625 in", "0.75 in"),
			stock("mdf", 1500, 5900).dims("width length", "2 ft|4 ft", "4 ft|8 ft").m("thickness", "0.5 in", "0.75 in"),
			stock("baseboard", 600, 3900).mat("pine", "poplar", "oak").m("length", "8 ft", "12 ft", "16 ft").titled(demoTitleAfter),
			stock("dowel", 150, 1200).mat("oak", "birch", "poplar").m("diameter", "0.25 in", "0.5 in", "0.75 in", "1 in").m("length", "36 in", "48 in"),
		},
	}
}

func demoHardware() *demoDept {
	return &demoDept{
		// Metric threads are at their ISO 261 coarse pitch
		// (testdata/reference/threads_metric_iso261_262.tsv), the pitch
		// hardware stores stock by default (common practice).
		category: "hardware", weight: 8, parts: []string{"XR", "HK", "TB"},
		brands: []string{"Felkabo", "Grumbelo", "Ivvatrope", "Plenkor"},
		blurbs: []string{
			"Backed by a lifetime warranty against defects.",
			"Trade prices for account holders.",
			"Made to stand up to daily site work.",
		},
		kinds: []*demoKind{
			stock("hex bolt", 400, 2400).mat("stainless steel", "galvanized", "steel").spec("M6x1", "M8x1.25", "M10x1.5", "M12x1.75").m("length", "30 mm", "40 mm", "50 mm", "60 mm", "80 mm", "100 mm").titled(demoTitleAfter),
			stock("machine screw", 300, 1500).mat("stainless steel", "zinc", "brass").spec("M3x0.5", "M4x0.7", "M5x0.8", "M6x1").m("length", "8 mm", "10 mm", "12 mm", "16 mm", "20 mm", "25 mm").titled(demoTitleAfter),
			stock("nut", 300, 1200).mat("stainless steel", "galvanized", "zinc").spec("M6x1", "M8x1.25", "M10x1.5", "M12x1.75"),
			stock("wood screw", 500, 2500).mat("zinc", "stainless steel", "brass").m("length", "1 in", "1.25 in", "1.5 in", "2 in", "2.5 in", "3 in").titled(demoTitleAfter),
			stock("deck screw", 900, 4500).mat("stainless steel", "galvanized").m("length", "2 in", "2.5 in", "3 in").titled(demoTitleAfter),
			stock("hammer", 1500, 4900).mat("steel", "fibreglass").m("head_weight", "16 oz", "20 oz", "22 oz").titled(demoTitleBefore),
			stock("sledgehammer", 2500, 6900).mat("steel", "fibreglass").m("head_weight", "3 lb", "4 lb", "8 lb", "10 lb").titled(demoTitleBefore),
			stock("tape measure", 900, 2900).m("length", "16 ft", "25 ft", "30 ft").titled(demoTitleBefore),
			stock("level", 900, 5900).mat("aluminium").m("length", "9 in", "24 in", "48 in").titled(demoTitleBefore),
			stock("drill", 5900, 22900).sil("cordless").m("voltage", "12 V", "18 V", "20 V").titled(demoTitleBefore),
			stock("impact driver", 7900, 21900).sil("cordless").m("voltage", "12 V", "18 V", "20 V").titled(demoTitleBefore),
			stock("circular saw", 6900, 19900).sil("cordless").m("blade_diameter", "6.5 in", "7.25 in"),
			stock("drill bit", 400, 1900).mat("high speed steel", "titanium").m("diameter", "0.125 in", "0.25 in", "0.375 in", "0.5 in"),
			stock("pipe wrench", 1900, 6900).mat("cast iron", "aluminium").m("length", "10 in", "14 in", "18 in", "24 in").titled(demoTitleBefore),
			stock("hinge", 300, 1500).mat("brass", "stainless steel", "zinc").m("length", "3 in", "3.5 in", "4 in"),
			stock("cabinet pull", 300, 1500).mat("brass", "stainless steel", "zinc").plain("black", "gold", "silver").m("hole_spacing", "3 in", "96 mm", "128 mm", "160 mm"),
			stock("padlock", 900, 3900).mat("brass", "steel", "stainless steel"),
			stock("garden hose", 1900, 7900).mat("rubber", "vinyl").plain("green", "black", "blue").m("length", "25 ft", "50 ft", "75 ft", "100 ft").titled(demoTitleBefore),
			stock("rope", 900, 3900).mat("nylon", "polypropylene", "jute").m("length", "50 ft", "100 ft", "200 ft"),
			stock("step ladder", 5900, 19900).mat("aluminium", "fibreglass").m("height", "4 ft", "6 ft", "8 ft").titled(demoTitleBefore),
			stock("extension ladder", 14900, 39900).mat("aluminium", "fibreglass").m("height", "16 ft", "20 ft", "24 ft", "28 ft").titled(demoTitleBefore),
			// PVC pipe comes in schedule 40 and the heavier 80 (ASTM
			// D1785, from memory).
			stock("pvc pipe", 300, 2500).m("diameter", "0.5 in", "0.75 in", "1 in", "1.5 in", "2 in").m("length", "10 ft").
				mLater("spec", "sch 40", "sch 40", "sch 80"),
		},
	}
}

func demoElectrical() *demoDept {
	return &demoDept{
		// Gauges are AWG (testdata/reference/awg_wire_diameters.tsv);
		// 14, 12 and 10 are the usual branch-circuit sizes and 16..12 the
		// usual extension cord sizes (common practice).
		category: "electrical", weight: 6, parts: []string{"EL", "QW", "NV"},
		brands: []string{"Noskaveld", "Hexlomby", "Trevanik"},
		blurbs: []string{
			"Tested to the store's own safety checks.",
			"Free returns within 30 days.",
			"Spare parts kept in stock.",
		},
		kinds: []*demoKind{
			stock("electrical wire", 1900, 18900).mat("copper").spec("14 awg", "12 awg", "10 awg").m("length", "25 ft", "50 ft", "100 ft", "250 ft").titled(demoTitleAfter),
			stock("extension cord", 1200, 8900).plain("orange", "black", "yellow").spec("16 awg", "14 awg", "12 awg").m("length", "10 ft", "25 ft", "50 ft", "100 ft").titled(demoTitleBefore),
			// The whites lamps are sold in (2700 K warm to 5000 K
			// daylight; common practice).
			stock("led bulb", 300, 1200).m("power", "5 W", "9 W", "11 W", "15 W").titled(demoTitleBefore).
				mLater("colour_temperature", "2700 K", "3000 K", "4000 K", "5000 K"),
			stock("smart bulb", 1200, 2900).m("power", "9 W", "10 W"),
			stock("light switch", 300, 1500).plain("white", "ivory", "black"),
			stock("dimmer switch", 1500, 4500).plain("white", "ivory", "black"),
			stock("outlet", 200, 1200).plain("white", "ivory", "black"),
			stock("gfci outlet", 1500, 2900).plain("white", "ivory"),
			stock("smart plug", 1200, 2900).plain("white"),
			stock("surge protector", 1500, 4900).plain("white", "black").m("cord_length", "3 ft", "6 ft", "10 ft"),
			stock("circuit breaker", 800, 4900).m("current", "15 A", "20 A", "30 A", "40 A", "50 A").titled(demoTitleBefore),
			stock("fuse", 300, 1200).m("current", "5 A", "10 A", "15 A", "20 A", "30 A").titled(demoTitleBefore),
			stock("ceiling fan", 8900, 34900).plain("white", "black", "bronze").m("blade_span", "42 in", "44 in", "52 in", "60 in").titled(demoTitleBefore),
			stock("led strip", 1500, 4900).m("length", "16 ft", "33 ft", "50 ft"),
			stock("string light", 1500, 5900).m("length", "25 ft", "48 ft", "100 ft"),
			stock("flashlight", 1200, 4900).mat("aluminium").plain("black", "red"),
			stock("headlamp", 1500, 4900).plain("black", "orange"),
			stock("conduit", 300, 1900).mat("pvc", "steel").m("diameter", "0.5 in", "0.75 in", "1 in"),
			stock("generator", 39900, 129900).m("power", "2000 W", "3500 W", "4500 W", "9500 W").titled(demoTitleBefore),
			stock("solar panel", 8900, 39900).m("power", "100 W", "200 W", "400 W").titled(demoTitleBefore),
		},
	}
}

func demoCamera() *demoDept {
	return &demoDept{
		category: "camera", weight: 5, parts: []string{"KV", "BD", "ML"},
		brands: []string{"Kavvilent", "Bodrinske", "Oskeldry"},
		blurbs: []string{
			"Two-year warranty with the store's repair service.",
			"Try it first at the camera counter.",
			"Ships the same day when ordered by noon.",
		},
		kinds: []*demoKind{
			stock("mirrorless camera", 59900, 249900).plain("black", "silver"),
			stock("compact camera", 29900, 89900).plain("black", "silver"),
			stock("action camera", 19900, 44900).plain("black"),
			stock("dash cam", 5900, 19900).plain("black"),
			stock("prime lens", 19900, 129900).plain("black").m("focal_length", "24 mm", "35 mm", "50 mm", "85 mm", "135 mm").fits(demoCameras).titled(demoTitleBefore),
			stock("telephoto lens", 49900, 199900).plain("black", "white").m("focal_length", "135 mm", "200 mm", "300 mm").fits(demoCameras).titled(demoTitleBefore),
			stock("wide angle lens", 29900, 119900).plain("black").m("focal_length", "14 mm", "16 mm", "20 mm", "24 mm").fits(demoCameras).titled(demoTitleBefore),
			stock("portrait lens", 39900, 109900).plain("black").m("focal_length", "85 mm", "105 mm", "135 mm").fits(demoCameras).titled(demoTitleBefore),
			stock("macro lens", 39900, 99900).plain("black").m("focal_length", "60 mm", "90 mm", "100 mm").fits(demoCameras).titled(demoTitleBefore),
			stock("zoom lens", 29900, 189900).plain("black").m("focal_length", "18-55 mm", "16-35 mm", "24-70 mm", "70-200 mm").fits(demoCameras).titled(demoTitleBefore),
			stock("uv filter", 1900, 6900).m("thread_diameter", "49 mm", "52 mm", "55 mm", "58 mm", "62 mm", "67 mm", "72 mm", "77 mm", "82 mm").titled(demoTitleBefore),
			stock("nd filter", 3900, 12900).m("thread_diameter", "52 mm", "58 mm", "62 mm", "67 mm", "72 mm", "77 mm", "82 mm").titled(demoTitleBefore),
			stock("polarizing filter", 2900, 11900).m("thread_diameter", "52 mm", "58 mm", "62 mm", "67 mm", "72 mm", "77 mm", "82 mm").titled(demoTitleBefore),
			stock("lens cap", 500, 1500).m("diameter", "49 mm", "52 mm", "58 mm", "62 mm", "67 mm", "72 mm", "77 mm").titled(demoTitleBefore),
			stock("tripod", 4900, 29900).mat("aluminium", "carbon fibre").m("max_height", "50 in", "60 in", "65 in", "72 in"),
			stock("camera strap", 1500, 5900).mat("leather", "nylon", "canvas").shopColoured().fits(demoCameras),
			stock("camera bag", 3900, 17900).mat("canvas", "nylon", "leather").shopColoured().sil("padded", "water resistant").fits(demoCameras),
			stock("remote shutter", 1500, 4900).fits(demoCameras),
			stock("battery grip", 4900, 19900).fits(demoCameras),
			stock("ring light", 2500, 9900).m("diameter", "10 in", "12 in", "18 in").titled(demoTitleBefore),
		},
	}
}

func demoTyres() *demoDept {
	return &demoDept{
		// ISO metric tyre sizes (see testdata/reference/tyre_size_examples.tsv);
		// the sizes are common passenger and SUV sizes (common practice).
		category: "tyres", weight: 4,
		brands: []string{"Worrilax", "Yoblinder", "Skelbrin"},
		blurbs: []string{
			"Fitting available at the store's service bay.",
			"Free local delivery on orders of four or more.",
			"Check your vehicle handbook before you order.",
		},
		kinds: []*demoKind{
			stock("all-season tyre", 7900, 24900).spec(demoPassengerTyres...),
			stock("winter tyre", 8900, 27900).spec(demoPassengerTyres...),
			stock("summer tyre", 8900, 26900).spec(demoPassengerTyres...),
			stock("all-weather tyre", 8900, 25900).spec(demoPassengerTyres...),
			stock("touring tyre", 8900, 24900).spec(demoPassengerTyres...),
			stock("performance tyre", 12900, 32900).spec("205/55R16", "225/45R17", "235/40R18", "245/40R18", "255/35R19"),
			stock("run-flat tyre", 14900, 34900).spec("205/55R16", "225/45R17", "245/45R18"),
			stock("all-terrain tyre", 14900, 32900).spec("245/75R16", "265/70R17", "265/65R18", "275/60R20"),
			stock("mud-terrain tyre", 17900, 36900).spec("245/75R16", "265/70R17", "285/70R17"),
			stock("snow chain", 4900, 14900).spec(demoPassengerTyres...),
			stock("wheel", 8900, 34900).mat("aluminium", "steel").plain("silver", "black", "gunmetal").m("diameter", "15 in", "16 in", "17 in", "18 in", "19 in").titled(demoTitleBefore),
			stock("tyre inflator", 2900, 8900).sil("cordless"),
			stock("tyre pressure gauge", 800, 2500),
		},
	}
}

func demoOffice() *demoDept {
	return &demoDept{
		// Paper sizes are ISO 216 (testdata/reference/iso216_paper_sizes.tsv).
		category: "office", weight: 5,
		brands: []string{"Zarkovue", "Jopplet"},
		blurbs: []string{
			"Part of the store's desk range.",
			"Free delivery on orders over $50.",
			"Bulk discounts for schools and offices.",
		},
		kinds: []*demoKind{
			stock("printer paper", 599, 1999).spec("A4").plain("white"),
			stock("notebook", 500, 2400).shopColoured().spec("A6", "A5", "A4"),
			stock("journal", 1500, 4900).mat("leather", "faux leather").shopColoured().spec("A6", "A5"),
			stock("sketchbook", 900, 2900).spec("A5", "A4", "A3").plain("black", "white"),
			stock("planner", 1500, 3900).shopColoured().spec("A6", "A5"),
			stock("binder", 400, 1500).plain("black", "white", "blue", "red").m("ring_size", "1 in", "1.5 in", "2 in", "3 in").titled(demoTitleBefore),
			stock("whiteboard", 2500, 19900).sil("wall mounted").dims("width height", "24 in|18 in", "36 in|24 in", "48 in|36 in", "72 in|48 in"),
			stock("corkboard", 1500, 8900).mat("cork").dims("width height", "24 in|18 in", "36 in|24 in", "48 in|36 in"),
			stock("ballpoint pen", 300, 1200).plain("black", "blue", "red"),
			stock("gel pen", 300, 1500).plain("black", "blue", "red", "green"),
			stock("fountain pen", 2900, 14900).shopColoured(),
			stock("highlighter", 200, 900).plain("yellow", "pink", "green", "orange"),
			stock("stapler", 900, 3900).plain("black", "silver"),
			stock("scissors", 500, 2500).mat("stainless steel"),
			stock("ruler", 200, 1500).mat("aluminium", "bamboo", "stainless steel").m("length", "6 in", "12 in", "18 in").titled(demoTitleBefore),
			stock("desk organizer", 1500, 4900).mat("bamboo", "steel", "mesh"),
		},
	}
}

func demoBatteries() *demoDept {
	return &demoDept{
		// Battery sizes are IEC 60086 (testdata/reference/iec60086_batteries.tsv);
		// NiMH capacities are typical of the size (common practice, from memory).
		category: "batteries", weight: 4,
		brands: []string{"Frennowik", "Tiskebran", "Brixolu"},
		blurbs: []string{
			"Store in a cool, dry place.",
			"Recycle used batteries at the store's collection point.",
			"Two-year warranty.",
		},
		kinds: []*demoKind{
			stock("alkaline battery", 499, 2499).spec("AAA", "AA", "9V"),
			stock("lithium battery", 899, 2999).spec("AAA", "AA", "9V"),
			stock("coin cell", 399, 1299).spec("CR1220", "CR2016", "CR2025", "CR2032", "CR2450"),
			stock("nimh battery", 999, 3499).dims("spec capacity", "AAA|800 mAh", "AAA|1000 mAh", "AA|2000 mAh", "AA|2500 mAh", "AA|2800 mAh"),
			stock("camera battery", 2900, 7900).m("capacity", "1020 mAh", "1200 mAh", "2000 mAh", "2280 mAh").fits(demoCameras),
			stock("tool battery", 4900, 17900).m("voltage", "12 V", "18 V", "20 V").m("capacity", "2000 mAh", "4000 mAh", "5000 mAh", "6000 mAh"),
			stock("battery charger", 2900, 8900).m("current", "1 A", "2 A", "10 A"),
			stock("jump starter", 6900, 17900).m("peak_current", "1000 A", "1500 A", "2000 A").m("capacity", "10000 mAh", "18000 mAh"),
			stock("car battery", 12900, 24900),
		},
	}
}

func demoElectronics() *demoDept {
	return &demoDept{
		category: "electronics", weight: 8,
		brands: []string{"Vuttelkor", "Strabbonix", "Emmerzulo", "Fennorac"},
		blurbs: []string{
			"Two-year warranty; returns within 30 days.",
			"Trade in your old device at the service desk.",
			"Ships the same day when ordered by noon.",
		},
		kinds: []*demoKind{
			stock("smart tv", 17900, 149900).plain("black").m("diagonal", "32 in", "43 in", "50 in", "55 in", "65 in", "75 in").titled(demoTitleBefore),
			stock("monitor", 12900, 79900).plain("black", "white").m("diagonal", "24 in", "27 in", "32 in", "34 in").titled(demoTitleBefore),
			stock("laptop", 49900, 229900).plain("silver", "grey", "black").m("diagonal", "13 in", "14 in", "15.6 in", "16 in").titled(demoTitleBefore),
			stock("tablet", 19900, 119900).plain("silver", "grey").m("diagonal", "8.3 in", "10.9 in", "11 in", "13 in").m("storage", "64 GB", "128 GB", "256 GB", "512 GB"),
			stock("phone", 29900, 119900).plain("black", "white", "blue").m("storage", "128 GB", "256 GB", "512 GB"),
			stock("phone case", 1500, 4900).mat("silicone", "leather", "polycarbonate").shopColoured().fits(demoPhones),
			stock("screen protector", 900, 2900).mat("tempered glass").fits(demoPhones),
			stock("earbuds", 4900, 24900).shopColoured(),
			stock("headphones", 5900, 34900).shopColoured(),
			stock("bluetooth speaker", 3900, 19900).shopColoured().sil("waterproof"),
			stock("usb cable", 699, 2499).plain("black", "white").m("length", "3 ft", "6 ft", "10 ft").titled(demoTitleBefore),
			stock("hdmi cable", 899, 3999).plain("black").m("length", "3 ft", "6 ft", "10 ft", "15 ft", "25 ft").titled(demoTitleBefore),
			stock("ethernet cable", 499, 3999).plain("blue", "grey", "black").m("length", "3 ft", "7 ft", "10 ft", "25 ft", "50 ft", "100 ft").titled(demoTitleBefore),
			stock("phone charger", 1500, 4900).plain("white", "black").m("power", "20 W", "25 W", "30 W", "45 W", "65 W").fits(demoPhones).titled(demoTitleBefore),
			stock("wireless charger", 1900, 5900).plain("white", "black").m("power", "10 W", "15 W").fits(demoPhones),
			stock("laptop charger", 2900, 7900).plain("white", "black").m("power", "45 W", "65 W", "100 W").fits(demoLaptops).titled(demoTitleBefore),
			stock("power bank", 1900, 8900).plain("black", "white").m("capacity", "5000 mAh", "10000 mAh", "20000 mAh", "26800 mAh").titled(demoTitleBefore),
			stock("microsd card", 699, 7999).m("capacity", "32 GB", "64 GB", "128 GB", "256 GB", "512 GB").titled(demoTitleBefore),
			stock("ssd", 4900, 34900).m("capacity", "500 GB", "1 TB", "2 TB", "4 TB").titled(demoTitleBefore),
			stock("external hard drive", 5900, 16900).plain("black", "silver").m("capacity", "1 TB", "2 TB", "4 TB", "5 TB").titled(demoTitleBefore),
			stock("keyboard", 1900, 14900).plain("black", "white", "grey"),
			stock("mouse", 1500, 7900).plain("black", "white", "grey"),
		},
	}
}

func demoPaint() *demoDept {
	return &demoDept{
		category: "paint", weight: 5, colourDefault: true,
		brands: []string{"Parrivunk", "Cridlemoss", "Ardisque"},
		blurbs: []string{
			"Ask the paint desk for advice on your project.",
			"Free colour cards at the paint desk.",
			"Part of the store's decorating range.",
		},
		kinds: []*demoKind{
			stock("interior paint", 1899, 24999).pat("matte", "eggshell finish", "satin finish", "semi gloss").m("volume", "1 qt", "1 gal", "5 gal"),
			stock("exterior paint", 2499, 27999).pat("satin finish", "semi gloss", "gloss").m("volume", "1 qt", "1 gal", "5 gal"),
			stock("ceiling paint", 2499, 17999).pat("matte").plain("white").m("volume", "1 gal", "5 gal"),
			stock("chalk paint", 1999, 4999).pat("matte").m("volume", "1 qt", "2 qt"),
			stock("spray paint", 599, 1499).pat("matte", "satin finish", "gloss", "metallic").m("net_weight", "10 oz", "12 oz", "15 oz"),
			stock("masonry paint", 2499, 8999).pat("matte").m("volume", "2.5 L", "5 L", "10 L"),
			stock("primer", 1999, 14999).plain("white", "grey").m("volume", "1 gal", "5 gal"),
			stock("wood stain", 1299, 4999).pat("matte", "satin finish").m("volume", "1 qt", "1 gal"),
			stock("deck stain", 2999, 19999).pat("satin finish").m("volume", "1 gal", "5 gal"),
			stock("polyurethane", 1499, 5999).pat("satin finish", "semi gloss", "gloss").colourless().m("volume", "1 qt", "1 gal"),
			stock("paint roller", 599, 1999).colourless().m("width", "4 in", "9 in").titled(demoTitleBefore),
			stock("paint brush", 399, 2499).colourless().m("width", "1 in", "1.5 in", "2 in", "2.5 in", "3 in").titled(demoTitleBefore),
			stock("painter's tape", 499, 1299).plain("blue", "green").m("width", "0.94 in", "1.41 in", "1.88 in"),
			stock("drop cloth", 699, 3999).mat("canvas", "plastic").colourless().dims("width length", "4 ft|12 ft", "6 ft|9 ft", "9 ft|12 ft"),
		},
	}
}

func demoKitchen() *demoDept {
	return &demoDept{
		category: "kitchen", weight: 8,
		brands: []string{"Moppelquist", "Ziravane", "Klombardo", "Plimsquoll", "Yuvrel"},
		blurbs: []string{
			"Backed by the store's ten-year kitchen guarantee.",
			"Gift wrapping available at the till.",
			"Part of the store's everyday kitchen range.",
		},
		kinds: []*demoKind{
			stock("stock pot", 3900, 14900).mat("stainless steel", "aluminium", "enamel").m("capacity", "6 qt", "8 qt", "12 qt", "16 qt", "20 qt").titled(demoTitleBefore),
			stock("saucepan", 2500, 9900).mat("stainless steel", "copper", "non stick").m("capacity", "1 qt", "1.5 qt", "2 qt", "3 qt", "4 qt").titled(demoTitleBefore),
			stock("dutch oven", 5900, 29900).mat("cast iron", "enamel").shopColoured().m("capacity", "3.5 qt", "4.5 qt", "5.5 qt", "7 qt").titled(demoTitleBefore),
			stock("skillet", 2500, 14900).mat("cast iron", "stainless steel", "carbon steel", "non stick").m("diameter", "8 in", "10 in", "12 in").titled(demoTitleBefore),
			stock("wok", 2900, 8900).mat("carbon steel", "cast iron", "non stick").m("diameter", "12 in", "14 in").titled(demoTitleBefore),
			stock("sheet pan", 1200, 3500).mat("aluminium", "stainless steel", "non stick").dims("width length", "9 in|13 in", "13 in|18 in"),
			stock("cake pan", 1200, 3500).mat("aluminium", "non stick").sil("round", "square").m("diameter", "8 in", "9 in", "10 in"),
			stock("chef's knife", 3900, 17900).mat("stainless steel", "carbon steel").m("blade_length", "6 in", "8 in", "10 in").titled(demoTitleBefore),
			stock("paring knife", 1500, 5900).mat("stainless steel", "carbon steel").m("blade_length", "3 in", "3.5 in", "4 in"),
			stock("santoku", 2900, 12900).mat("stainless steel", "carbon steel").m("blade_length", "5 in", "7 in").titled(demoTitleBefore),
			stock("bread knife", 2500, 8900).mat("stainless steel").m("blade_length", "8 in", "9 in", "10 in"),
			stock("cutting board", 1900, 9900).mat("maple", "walnut", "acacia", "bamboo").dims("width length", "10 in|14 in", "12 in|18 in", "15 in|20 in", "18 in|24 in"),
			stock("electric kettle", 2900, 11900).mat("stainless steel", "glass").shopColoured().m("capacity", "1 L", "1.5 L", "1.7 L"),
			stock("blender", 4900, 24900).plain("black", "silver", "white").m("power", "600 W", "900 W", "1200 W", "1500 W").titled(demoTitleBefore),
			stock("stand mixer", 19900, 49900).shopColoured().m("power", "300 W", "500 W", "575 W"),
			stock("air fryer", 5900, 17900).plain("black", "white", "grey").m("capacity", "4 qt", "5.8 qt", "6 qt", "8 qt").titled(demoTitleBefore),
			stock("slow cooker", 3900, 9900).plain("black", "silver").m("capacity", "4 qt", "6 qt", "7 qt").titled(demoTitleBefore),
			stock("rice cooker", 2900, 12900).plain("white", "black").m("capacity", "1 L", "1.8 L"),
			stock("french press", 1900, 5900).mat("borosilicate glass", "stainless steel").m("capacity", "12 fl oz", "34 fl oz", "51 fl oz"),
			stock("mug", 900, 2900).mat("stoneware", "ceramic", "porcelain").shopColoured().m("capacity", "10 fl oz", "12 fl oz", "14 fl oz", "16 fl oz"),
			stock("travel mug", 1500, 3900).mat("stainless steel").shopColoured().m("capacity", "12 fl oz", "16 fl oz", "20 fl oz"),
			stock("water bottle", 1500, 4900).mat("stainless steel", "plastic").shopColoured().m("capacity", "18 fl oz", "24 fl oz", "32 fl oz", "40 fl oz").titled(demoTitleBefore),
			stock("food container", 800, 2900).mat("glass", "borosilicate glass", "plastic").m("capacity", "500 mL", "750 mL", "1000 mL", "1500 mL"),
			stock("mixing bowl", 900, 3900).mat("stainless steel", "glass", "ceramic").m("capacity", "1.5 qt", "3 qt", "5 qt"),
			stock("water filter", 999, 2999).fits(demoPitchers),
			stock("kitchen scale", 1500, 4900).plain("black", "white", "silver").m("max_weight", "5 kg", "10 kg"),
		},
	}
}
