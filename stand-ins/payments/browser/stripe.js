/*
 * Local stand-in for the payment provider's browser library (plain JS, no build step).
 *
 * Load it with a classic <script> BEFORE the app's bundle, only when the local fakes are on:
 *   <script src="http://127.0.0.1:12111/stripe.js"></script>
 * It talks to the API of the server it was loaded from (or to `data-api-base` when given).
 * `loadStripe()` from @stripe/stripe-js 10 uses an existing `window.Stripe` instead of injecting
 * the hosted script, so <Elements>/<PaymentElement> from @stripe/react-stripe-js 7 run unchanged
 * against the payments stand-in (stand-ins/payments), which serves this file at /stripe.js.
 *
 * What it provides: Stripe(pk) with elements(), confirmPayment(), confirmCardPayment(),
 * retrievePaymentIntent(), handleNextAction(), registerAppInfo(), _registerWrapper();
 * elements.create('payment') renders real, labelled card inputs (number, MM / YY, CVC) and
 * validates them (Luhn, future expiry, 3–4 digit CVC). Other element types render a short
 * notice; other methods resolve to { error } saying they are not available locally.
 *
 * Wire shape of a confirm (form-encoded, like the real library; publishable key in `key`):
 *   POST {apiBase}/v1/payment_intents/:id/confirm
 *   key=pk_test_…&client_secret=pi_…_secret_…&payment_method_data[type]=card
 *   &payment_method_data[card][number]=4242424242424242&…[exp_month]=12&…[exp_year]=2030&…[cvc]=123
 *   &return_url=…&expand[0]=payment_method
 */
(function () {
  "use strict";

  var currentScript =
    document.currentScript || document.querySelector('script[src$="/stripe.js"]');
  var API_BASE = (
    (currentScript && currentScript.dataset.apiBase) ||
    (currentScript && currentScript.src ? new URL(currentScript.src).origin : "") ||
    "http://127.0.0.1:12111"
  ).replace(/\/+$/, "");
  // @stripe/stripe-js compares this with its release train and warns on a mismatch for test keys.
  var RELEASE_TRAIN = "endive";
  var STYLE_ID = "rwps-stand-in-style";
  var nextId = 0;

  var TEST_CARD_NOTE =
    "Local test stand-in: no real payment is made. Test cards: " +
    "<code>4242 4242 4242 4242</code> pays, <code>4000 0000 0000 0002</code> is declined, " +
    "<code>4000 0000 0000 9995</code> has insufficient funds. Any future date and any 3-digit code.";

  var CSS = [
    ".rwps{--rwps-primary:#1d5c46;--rwps-text:#1f2a24;--rwps-bg:#fff;--rwps-danger:#a3261a;--rwps-radius:6px;",
    "--rwps-font:system-ui,-apple-system,'Segoe UI',sans-serif;font-family:var(--rwps-font);font-size:16px;line-height:1.4;color:var(--rwps-text);text-align:left}",
    ".rwps *,.rwps *::before,.rwps *::after{box-sizing:border-box}",
    ".rwps-fieldset{border:0;margin:0;padding:0;min-width:0}",
    ".rwps-legend{padding:0;margin:0 0 8px;font-weight:600;font-size:16px}",
    ".rwps-field{margin:0 0 12px}",
    ".rwps-row{display:flex;flex-wrap:wrap;gap:12px}.rwps-row>.rwps-field{flex:1 1 9rem}",
    ".rwps-label{display:block;margin:0 0 4px;font-size:15px;font-weight:500}",
    ".rwps-input{display:block;width:100%;margin:0;padding:10px 12px;font:inherit;font-size:16px;color:var(--rwps-text);",
    "background:var(--rwps-bg);border:1px solid #6b756f;border-radius:var(--rwps-radius);-webkit-appearance:none;appearance:none}",
    ".rwps-input::placeholder{color:#6b756f;opacity:1}",
    ".rwps-input:focus{outline:3px solid var(--rwps-primary);outline-offset:1px;border-color:var(--rwps-primary)}",
    ".rwps-input[aria-invalid=true]{border-color:var(--rwps-danger)}",
    ".rwps-input:disabled{background:#eeece6}",
    ".rwps-error{margin:0;color:var(--rwps-danger);font-size:14px}.rwps-error:not(:empty){margin-top:4px}",
    ".rwps-note{margin:4px 0 0;padding:8px 10px;background:#f4f1e6;border-radius:var(--rwps-radius);font-size:14px;color:#3d4a42}",
    ".rwps-note code{font-family:ui-monospace,Menlo,Consolas,monospace;font-size:14px;white-space:nowrap}",
  ].join("");

  function injectStyle() {
    if (document.getElementById(STYLE_ID)) return;
    var style = document.createElement("style");
    style.id = STYLE_ID;
    style.textContent = CSS;
    (document.head || document.documentElement).appendChild(style);
  }

  /* ---------- small helpers ---------- */

  function createEmitter() {
    var handlers = {};
    return {
      on: function (type, handler) {
        (handlers[type] = handlers[type] || []).push(handler);
      },
      off: function (type, handler) {
        if (!handlers[type]) return;
        handlers[type] = handler
          ? handlers[type].filter(function (h) {
              return h !== handler && h._original !== handler;
            })
          : [];
      },
      once: function (type, handler) {
        var self = this;
        var wrapped = function (event) {
          self.off(type, wrapped);
          handler(event);
        };
        wrapped._original = handler;
        this.on(type, wrapped);
      },
      emit: function (type, event) {
        (handlers[type] || []).slice().forEach(function (handler) {
          try {
            handler(event);
          } catch (error) {
            setTimeout(function () {
              throw error;
            });
          }
        });
      },
    };
  }

  function integrationError(message) {
    var error = new Error(message);
    error.name = "IntegrationError";
    return error;
  }

  function encodeForm(value, prefix, pairs) {
    if (value === undefined || value === null) return pairs;
    if (typeof value === "object") {
      Object.keys(value).forEach(function (key) {
        encodeForm(value[key], prefix ? prefix + "[" + key + "]" : key, pairs);
      });
      return pairs;
    }
    pairs.push(encodeURIComponent(prefix) + "=" + encodeURIComponent(String(value)));
    return pairs;
  }

  function callApi(method, path, params) {
    var body = encodeForm(params, "", []).join("&");
    var url = API_BASE + path + (method === "GET" ? "?" + body : "");
    // Form-encoded POST without custom headers: a "simple" CORS request, no preflight.
    var init =
      method === "GET"
        ? { method: "GET" }
        : {
            method: "POST",
            headers: { "Content-Type": "application/x-www-form-urlencoded" },
            body: body,
          };
    return fetch(url, init).then(
      function (response) {
        return response.json().then(function (json) {
          return { status: response.status, body: json };
        });
      },
      function () {
        return {
          status: 0,
          body: {
            error: {
              type: "api_connection_error",
              message: "Could not reach the local payments stand-in at " + API_BASE + ".",
            },
          },
        };
      },
    );
  }

  function intentIdFrom(clientSecret) {
    return String(clientSecret || "").split("_secret_")[0];
  }

  /* ---------- card rules (same as stand-ins/payments/test-cards.ts) ---------- */

  // Luhn (mod 10): H. P. Luhn, U.S. Patent 2,950,048 (1960).
  function isLuhnValid(digits) {
    var sum = 0;
    for (var i = 0; i < digits.length; i += 1) {
      var digit = Number(digits[digits.length - 1 - i]);
      var doubled = i % 2 === 1 ? digit * 2 : digit;
      sum += doubled > 9 ? doubled - 9 : doubled;
    }
    return digits.length > 0 && sum % 10 === 0;
  }

  function expectedLength(digits) {
    return /^3[47]/.test(digits) ? 15 : 16;
  }

  function checkNumber(digits) {
    if (digits.length === 0)
      return { code: "incomplete_number", message: "Your card number is incomplete." };
    if (digits.length < expectedLength(digits))
      return { code: "incomplete_number", message: "Your card number is incomplete." };
    if (!isLuhnValid(digits))
      return { code: "invalid_number", message: "Your card number is invalid." };
    return null;
  }

  function checkExpiry(digits, now) {
    if (digits.length < 4)
      return { code: "incomplete_expiry", message: "Your card's expiration date is incomplete." };
    var month = Number(digits.slice(0, 2));
    var year = 2000 + Number(digits.slice(2, 4));
    if (month < 1 || month > 12)
      return { code: "invalid_expiry_month", message: "Your card's expiration month is invalid." };
    var thisYear = now.getFullYear();
    if (year < thisYear)
      return {
        code: "invalid_expiry_year_past",
        message: "Your card's expiration year is in the past.",
      };
    if (year === thisYear && month < now.getMonth() + 1) {
      return {
        code: "invalid_expiry_month_past",
        message: "Your card's expiration date is in the past.",
      };
    }
    return null;
  }

  function checkCvc(digits) {
    if (digits.length < 3)
      return { code: "incomplete_cvc", message: "Your card's security code is incomplete." };
    return null;
  }

  /* ---------- the payment element ---------- */

  var FIELDS = [
    {
      key: "number",
      label: "Card number",
      autocomplete: "cc-number",
      placeholder: "1234 1234 1234 1234",
      max: 19,
      format: function (d) {
        return d.replace(/(\d{4})(?=\d)/g, "$1 ");
      },
      check: checkNumber,
    },
    {
      key: "expiry",
      label: "Expiration date (MM / YY)",
      autocomplete: "cc-exp",
      placeholder: "MM / YY",
      max: 4,
      format: function (d) {
        if (d.length === 1 && d > "1") d = "0" + d;
        return d.length > 2 ? d.slice(0, 2) + " / " + d.slice(2) : d;
      },
      check: function (d) {
        return checkExpiry(d, new Date());
      },
    },
    {
      key: "cvc",
      label: "Security code (CVC)",
      autocomplete: "cc-csc",
      placeholder: "CVC",
      max: 4,
      format: function (d) {
        return d;
      },
      check: checkCvc,
    },
  ];

  function applyAppearance(root, appearance) {
    var vars = (appearance && appearance.variables) || {};
    var map = {
      colorPrimary: "--rwps-primary",
      colorText: "--rwps-text",
      colorBackground: "--rwps-bg",
      colorDanger: "--rwps-danger",
      borderRadius: "--rwps-radius",
      fontFamily: "--rwps-font",
    };
    Object.keys(map).forEach(function (name) {
      if (vars[name]) root.style.setProperty(map[name], vars[name]);
      else root.style.removeProperty(map[name]);
    });
  }

  function createPaymentElement(group, options) {
    var emitter = createEmitter();
    var uid = "rwps-" + (nextId += 1);
    var inputs = {};
    var errors = {};
    var root = null;
    var container = null;
    var destroyed = false;
    var readyFired = false;
    var readOnly = Boolean(options && options.readOnly);

    function digitsOf(key) {
      return inputs[key] ? inputs[key].value.replace(/\D/g, "") : "";
    }

    function problems() {
      return FIELDS.map(function (field) {
        return { field: field, problem: field.check(digitsOf(field.key)) };
      });
    }

    function showError(key, problem) {
      var input = inputs[key];
      if (!input) return;
      errors[key].textContent = problem ? problem.message : "";
      input.setAttribute("aria-invalid", problem ? "true" : "false");
    }

    function changeEvent() {
      var all = problems();
      return {
        elementType: "payment",
        complete: all.every(function (item) {
          return !item.problem;
        }),
        empty: FIELDS.every(function (field) {
          return digitsOf(field.key) === "";
        }),
        collapsed: false,
        value: { type: "card" },
      };
    }

    function reformat(input, field) {
      var raw = input.value;
      var caret = input.selectionStart === null ? raw.length : input.selectionStart;
      var digitsBefore = raw.slice(0, caret).replace(/\D/g, "").length;
      var formatted = field.format(raw.replace(/\D/g, "").slice(0, field.max));
      input.value = formatted;
      var position = 0;
      for (var seen = 0; position < formatted.length && seen < digitsBefore; position += 1) {
        if (/\d/.test(formatted[position])) seen += 1;
      }
      if (document.activeElement === input) input.setSelectionRange(position, position);
    }

    function build() {
      injectStyle();
      var wrapper = document.createElement("div");
      wrapper.className = "rwps";
      wrapper.setAttribute("data-stand-in", "payments");
      var fieldset = document.createElement("fieldset");
      fieldset.className = "rwps-fieldset";
      var legend = document.createElement("legend");
      legend.className = "rwps-legend";
      legend.textContent = "Pay by card";
      fieldset.appendChild(legend);
      var row = document.createElement("div");
      row.className = "rwps-row";
      FIELDS.forEach(function (field, index) {
        var box = document.createElement("div");
        box.className = "rwps-field";
        var id = uid + "-" + field.key;
        var label = document.createElement("label");
        label.className = "rwps-label";
        label.htmlFor = id;
        label.textContent = field.label;
        var input = document.createElement("input");
        input.className = "rwps-input";
        input.id = id;
        input.name = field.autocomplete;
        input.type = "text";
        input.inputMode = "numeric";
        input.autocomplete = field.autocomplete;
        input.placeholder = field.placeholder;
        input.spellcheck = false;
        input.disabled = readOnly;
        input.setAttribute("autocorrect", "off");
        input.setAttribute("aria-describedby", id + "-error");
        input.setAttribute("aria-invalid", "false");
        var error = document.createElement("p");
        error.className = "rwps-error";
        error.id = id + "-error";
        // aria-live, not role=alert: host pages' tests look up their own alerts by role.
        error.setAttribute("aria-live", "polite");
        input.addEventListener("input", function () {
          reformat(input, field);
          if (input.getAttribute("aria-invalid") === "true")
            showError(field.key, field.check(digitsOf(field.key)));
          emitter.emit("change", changeEvent());
        });
        input.addEventListener("blur", function () {
          var digits = digitsOf(field.key);
          showError(field.key, digits === "" ? null : field.check(digits));
        });
        inputs[field.key] = input;
        errors[field.key] = error;
        box.appendChild(label);
        box.appendChild(input);
        box.appendChild(error);
        (index === 0 ? fieldset : row).appendChild(box);
      });
      fieldset.appendChild(row);
      wrapper.appendChild(fieldset);
      var note = document.createElement("p");
      note.className = "rwps-note";
      note.innerHTML = TEST_CARD_NOTE;
      wrapper.appendChild(note);
      wrapper.addEventListener("focusin", function (event) {
        if (!wrapper.contains(event.relatedTarget))
          emitter.emit("focus", { elementType: "payment" });
      });
      wrapper.addEventListener("focusout", function (event) {
        if (!wrapper.contains(event.relatedTarget))
          emitter.emit("blur", { elementType: "payment" });
      });
      applyAppearance(wrapper, group._options.appearance);
      return wrapper;
    }

    var element = {
      mount: function (target) {
        if (destroyed)
          throw integrationError(
            "This Element has already been destroyed. Please create a new one.",
          );
        var node = typeof target === "string" ? document.querySelector(target) : target;
        if (!node || !node.appendChild)
          throw integrationError(
            "The selector you specified (" + target + ") applies to no DOM elements.",
          );
        if (container)
          throw integrationError(
            "This Element is already mounted. Use `unmount()` before mounting it again.",
          );
        root = root || build();
        container = node;
        node.appendChild(root);
        emitter.emit("loaderstart", { elementType: "payment" });
        // The real element loads in a frame and reports ready a little later; keep that asynchrony.
        setTimeout(function () {
          if (!container || readyFired) return;
          readyFired = true;
          emitter.emit("ready", { elementType: "payment" });
        }, 30);
      },
      unmount: function () {
        if (root && root.parentNode) root.parentNode.removeChild(root);
        container = null;
      },
      destroy: function () {
        if (destroyed) return;
        element.unmount();
        destroyed = true;
        root = null;
        group._forget("payment", element);
      },
      on: function (type, handler) {
        emitter.on(type, handler);
        // A listener added after `ready` fired (React attaches it in an effect) still hears it once.
        if (type === "ready" && readyFired) {
          setTimeout(function () {
            handler({ elementType: "payment" });
          });
        }
        return element;
      },
      once: function (type, handler) {
        emitter.once(type, handler);
        return element;
      },
      off: function (type, handler) {
        emitter.off(type, handler);
        return element;
      },
      update: function (updates) {
        if (updates && "readOnly" in updates) {
          readOnly = Boolean(updates.readOnly);
          Object.keys(inputs).forEach(function (key) {
            inputs[key].disabled = readOnly;
          });
        }
        return element;
      },
      focus: function () {
        if (inputs.number) inputs.number.focus();
      },
      blur: function () {
        if (root && root.contains(document.activeElement)) document.activeElement.blur();
      },
      clear: function () {
        FIELDS.forEach(function (field) {
          if (inputs[field.key]) inputs[field.key].value = "";
          showError(field.key, null);
        });
        emitter.emit("change", changeEvent());
      },
      collapse: function () {
        return element;
      },
      _applyAppearance: function (appearance) {
        if (root) applyAppearance(root, appearance);
      },
      /** Shows every problem, focuses the first, and returns it (or null when complete). */
      _validate: function () {
        var first = null;
        problems().forEach(function (item) {
          showError(item.field.key, item.problem);
          if (item.problem && !first) first = item;
        });
        if (first && inputs[first.field.key]) inputs[first.field.key].focus();
        return first
          ? { type: "validation_error", code: first.problem.code, message: first.problem.message }
          : null;
      },
      _cardData: function () {
        var expiry = digitsOf("expiry");
        return {
          number: digitsOf("number"),
          exp_month: expiry.slice(0, 2),
          exp_year: "20" + expiry.slice(2, 4),
          cvc: digitsOf("cvc"),
        };
      },
    };
    return element;
  }

  /** Any other element type: renders a short notice so the page still works, never completes. */
  function createNoticeElement(group, type) {
    var emitter = createEmitter();
    var node = null;
    var element = {
      mount: function (target) {
        var host = typeof target === "string" ? document.querySelector(target) : target;
        injectStyle();
        node = document.createElement("p");
        node.className = "rwps rwps-note";
        node.textContent =
          "The “" + type + "” element is not available in the local payments stand-in.";
        if (host) host.appendChild(node);
        setTimeout(function () {
          emitter.emit("ready", { elementType: type });
        }, 30);
      },
      unmount: function () {
        if (node && node.parentNode) node.parentNode.removeChild(node);
      },
      destroy: function () {
        element.unmount();
        group._forget(type, element);
      },
      on: function (t, h) {
        emitter.on(t, h);
        return element;
      },
      once: function (t, h) {
        emitter.once(t, h);
        return element;
      },
      off: function (t, h) {
        emitter.off(t, h);
        return element;
      },
      update: function () {
        return element;
      },
      focus: function () {},
      blur: function () {},
      clear: function () {},
      collapse: function () {
        return element;
      },
    };
    return element;
  }

  /* ---------- elements group ---------- */

  function createElementsGroup(stripe, options) {
    var emitter = createEmitter();
    var created = {};
    var group = {
      _options: Object.assign({}, options || {}),
      _forget: function (type, element) {
        if (created[type] === element) delete created[type];
      },
      create: function (type, elementOptions) {
        if (created[type])
          throw integrationError("Can only create one Element of type " + type + ".");
        var element =
          type === "payment"
            ? createPaymentElement(group, elementOptions)
            : createNoticeElement(group, type);
        created[type] = element;
        return element;
      },
      getElement: function (type) {
        return created[type] || null;
      },
      update: function (updates) {
        Object.assign(group._options, updates || {});
        Object.keys(created).forEach(function (type) {
          if (created[type]._applyAppearance)
            created[type]._applyAppearance(group._options.appearance);
        });
        setTimeout(function () {
          emitter.emit("update-end", {});
        });
        return Promise.resolve();
      },
      fetchUpdates: function () {
        var secret = group._options.clientSecret;
        if (!secret) return Promise.resolve({});
        return stripe.retrievePaymentIntent(secret).then(function (result) {
          return result.error ? { error: { message: result.error.message } } : {};
        });
      },
      submit: function () {
        var element = created.payment;
        if (!element) {
          return Promise.resolve({
            error: { type: "validation_error", message: "No Payment Element is mounted." },
          });
        }
        var error = element._validate();
        return Promise.resolve(error ? { error: error } : { selectedPaymentMethod: "card" });
      },
      on: function (type, handler) {
        emitter.on(type, handler);
        return group;
      },
      once: function (type, handler) {
        emitter.once(type, handler);
        return group;
      },
      off: function (type, handler) {
        emitter.off(type, handler);
        return group;
      },
    };
    return group;
  }

  /* ---------- the Stripe object ---------- */

  function unsupported(name) {
    return function () {
      return Promise.resolve({
        error: {
          type: "invalid_request_error",
          message: "stripe." + name + "() is not available in the local payments stand-in.",
        },
      });
    };
  }

  var UNSUPPORTED = [
    "createToken",
    "createPaymentMethod",
    "createConfirmationToken",
    "createSource",
    "retrieveSource",
    "confirmSetup",
    "confirmCardSetup",
    "retrieveSetupIntent",
    "handleCardAction",
    "verifyIdentity",
    "collectBankAccountForPayment",
    "collectBankAccountForSetup",
    "collectBankAccountToken",
    "collectFinancialConnectionsAccounts",
    "verifyMicrodepositsForPayment",
    "verifyMicrodepositsForSetup",
    "confirmAcssDebitPayment",
    "confirmAffirmPayment",
    "confirmAfterpayClearpayPayment",
    "confirmAlipayPayment",
    "confirmAuBecsDebitPayment",
    "confirmBancontactPayment",
    "confirmBlikPayment",
    "confirmBoletoPayment",
    "confirmCashappPayment",
    "confirmCustomerBalancePayment",
    "confirmEpsPayment",
    "confirmFpxPayment",
    "confirmGiropayPayment",
    "confirmGrabPayPayment",
    "confirmIdealPayment",
    "confirmKlarnaPayment",
    "confirmKonbiniPayment",
    "confirmMobilepayPayment",
    "confirmMultibancoPayment",
    "confirmOxxoPayment",
    "confirmP24Payment",
    "confirmPayNowPayment",
    "confirmPayPalPayment",
    "confirmPixPayment",
    "confirmPromptPayPayment",
    "confirmSepaDebitPayment",
    "confirmSofortPayment",
    "confirmTwintPayment",
    "confirmUsBankAccountPayment",
    "confirmWechatPayPayment",
    "retrieveOrder",
    "processOrder",
    "initCheckout",
    "initEmbeddedCheckout",
    "createEmbeddedCheckoutPage",
    "initCheckoutElementsSdk",
    "initCheckoutFormSdk",
    "createEphemeralKeyNonce",
    "createRadarSession",
    "initializePricing",
  ];

  function createStripe(publishableKey, stripeOptions) {
    if (typeof publishableKey !== "string" || publishableKey.indexOf("pk_") !== 0) {
      throw integrationError(
        "Invalid value for Stripe(): apiKey should be a publishable key (pk_…). You passed: " +
          publishableKey +
          ".",
      );
    }

    function confirmWithCard(clientSecret, card, extra) {
      var params = Object.assign({}, extra, {
        key: publishableKey,
        client_secret: clientSecret,
        payment_method_data: Object.assign(
          { type: "card", card: card },
          extra.payment_method_data || {},
        ),
        expand: ["payment_method"],
      });
      params.payment_method_data.card = card;
      return callApi(
        "POST",
        "/v1/payment_intents/" + intentIdFrom(clientSecret) + "/confirm",
        params,
      );
    }

    function toResult(answer) {
      if (answer.status === 200) return { paymentIntent: answer.body };
      return {
        error:
          answer.body && answer.body.error
            ? answer.body.error
            : { type: "api_error", message: "Unexpected answer." },
      };
    }

    var stripe = {
      _apiBase: API_BASE,
      _stripeOptions: stripeOptions || {},
      elements: function (options) {
        return createElementsGroup(stripe, options);
      },
      confirmPayment: function (args) {
        args = args || {};
        var elements = args.elements;
        var clientSecret = args.clientSecret || (elements && elements._options.clientSecret);
        var confirmParams = args.confirmParams || {};
        if (!clientSecret) {
          return Promise.reject(
            integrationError(
              "stripe.confirmPayment(): a clientSecret is required (in Elements options or as clientSecret).",
            ),
          );
        }
        if (args.redirect !== "if_required" && !confirmParams.return_url) {
          return Promise.reject(
            integrationError(
              "stripe.confirmPayment(): the `confirmParams.return_url` argument is required unless passing `redirect: 'if_required'`.",
            ),
          );
        }
        var element = elements && elements.getElement("payment");
        if (!element) {
          return Promise.reject(
            integrationError(
              "stripe.confirmPayment(): no Payment Element is mounted in these elements.",
            ),
          );
        }
        var invalid = element._validate();
        if (invalid) return Promise.resolve({ error: invalid });
        var extra = {};
        ["return_url", "receipt_email", "shipping", "payment_method_data"].forEach(function (key) {
          if (confirmParams[key] !== undefined) extra[key] = confirmParams[key];
        });
        return confirmWithCard(clientSecret, element._cardData(), extra).then(function (answer) {
          var result = toResult(answer);
          if (result.error || args.redirect === "if_required") return result;
          var url = confirmParams.return_url;
          var query =
            "payment_intent=" +
            encodeURIComponent(result.paymentIntent.id) +
            "&payment_intent_client_secret=" +
            encodeURIComponent(clientSecret) +
            "&redirect_status=succeeded";
          window.location.assign(url + (url.indexOf("?") === -1 ? "?" : "&") + query);
          // Like the real library: the promise never settles because the page navigates away.
          return new Promise(function () {});
        });
      },
      confirmCardPayment: function (clientSecret, data) {
        var method = data && data.payment_method;
        if (typeof method === "string") {
          return callApi("POST", "/v1/payment_intents/" + intentIdFrom(clientSecret) + "/confirm", {
            key: publishableKey,
            client_secret: clientSecret,
            payment_method: method,
          }).then(toResult);
        }
        var element = method && method.card;
        if (!element || !element._validate) {
          return Promise.resolve({
            error: {
              type: "invalid_request_error",
              message: "Pass { payment_method: { card: paymentElement } } or a payment method id.",
            },
          });
        }
        var invalid = element._validate();
        if (invalid) return Promise.resolve({ error: invalid });
        var extra = method.billing_details
          ? { payment_method_data: { billing_details: method.billing_details } }
          : {};
        return confirmWithCard(clientSecret, element._cardData(), extra).then(toResult);
      },
      retrievePaymentIntent: function (clientSecret) {
        return callApi("GET", "/v1/payment_intents/" + intentIdFrom(clientSecret), {
          key: publishableKey,
          client_secret: clientSecret,
        }).then(toResult);
      },
      handleNextAction: function (args) {
        return stripe.retrievePaymentIntent(args && args.clientSecret);
      },
      paymentRequest: function () {
        var emitter = createEmitter();
        return {
          canMakePayment: function () {
            return Promise.resolve(null);
          },
          show: function () {},
          abort: function () {},
          update: function () {},
          isShowing: function () {
            return false;
          },
          on: function (t, h) {
            emitter.on(t, h);
          },
          off: function (t, h) {
            emitter.off(t, h);
          },
          once: function (t, h) {
            emitter.once(t, h);
          },
        };
      },
      registerAppInfo: function () {},
      _registerWrapper: function () {},
    };
    UNSUPPORTED.forEach(function (name) {
      stripe[name] = unsupported(name);
    });
    return stripe;
  }

  window.Stripe = function Stripe(publishableKey, options) {
    return createStripe(publishableKey, options);
  };
  window.Stripe.version = RELEASE_TRAIN;
  window.Stripe.standIn = { apiBase: API_BASE };
})();
